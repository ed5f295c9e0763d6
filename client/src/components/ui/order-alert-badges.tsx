import { Group } from '@mantine/core';
import type { ObservationDue } from '@lockstep/shared';
import { describeNextObservation } from '@/utils/next-observation';
import { urgentFlagsLabel } from '@/utils/order-alerts';
import { PausedBadge } from './paused-badge';
import { SeverityBadge } from './severity-badge';

export interface OrderAlertBadgesProps {
  openUrgentFlags: number;
  nextObservation: ObservationDue | null;
  now: Date;
  /** The PCA is paused (by a nurse, or naloxone given) until a two-nurse resume. */
  paused?: boolean;
}

/** A running PCA's pause, open urgent flags and an overdue observation, each as icon + word + colour; nothing when none. */
export function OrderAlertBadges({ openUrgentFlags, nextObservation, now, paused = false }: OrderAlertBadgesProps) {
  const due = nextObservation ? describeNextObservation(nextObservation, now) : null;
  const overdue = due && due.tone !== 'ok' ? due : null;
  if (!paused && openUrgentFlags === 0 && !overdue) return null;
  return (
    <Group gap={6} wrap="wrap">
      {paused ? <PausedBadge size="sm" /> : null}
      {openUrgentFlags > 0 ? <SeverityBadge severity="urgent" size="sm" label={urgentFlagsLabel(openUrgentFlags)} /> : null}
      {overdue ? (
        <SeverityBadge severity={overdue.tone as 'review' | 'urgent'} size="sm" label={`Observation ${overdue.headline.toLowerCase()}`} />
      ) : null}
    </Group>
  );
}
