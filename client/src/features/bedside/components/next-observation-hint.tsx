import { Group, Text } from '@mantine/core';
import { IconClock } from '@tabler/icons-react';
import type { ObservationDue } from '@lockstep/shared';
import { SeverityBadge } from '@/components/ui/severity-badge';
import { describeNextObservation } from '@/utils/next-observation';

/** A running PCA's next observation in a list: when it is due, or overdue with icon, word and colour. */
export function NextObservationHint({ due, now }: { due: ObservationDue; now: Date }) {
  const state = describeNextObservation(due, now);
  if (state.tone === 'ok') {
    return (
      <Group gap={4} wrap="nowrap">
        <IconClock size={14} aria-hidden />
        <Text size="xs" className="tabular-nums">
          Observation {state.headline.toLowerCase()}
        </Text>
      </Group>
    );
  }
  return (
    <Group gap={6} wrap="wrap">
      <SeverityBadge severity={state.tone} size="sm" />
      <Text size="xs" fw={600} className="tabular-nums">
        Observation {state.headline.toLowerCase()}
      </Text>
    </Group>
  );
}
