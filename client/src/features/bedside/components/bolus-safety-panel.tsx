import { Alert, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { bolusSafetyRefusal, SEDATION_DESCRIPTIONS, type FlagResponse, type ObservationResponse } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';

/**
 * Before a clinician bolus: the order's latest sedation score and breathing, and a caution when the
 * server would refuse the bolus (the shared `bolusSafetyRefusal`: sedation 3 or more, or an urgent
 * breathing flag open).
 */
export function BolusSafetyPanel({
  observation,
  flags,
  loading = false,
  unreadable = false,
}: {
  /** The order's latest observation; null when none is recorded yet. */
  observation: ObservationResponse | null;
  flags: readonly FlagResponse[];
  loading?: boolean;
  /** The observations could not be read: never shown as "none recorded". */
  unreadable?: boolean;
}) {
  if (loading) return <Text c="dimmed">Reading the last observation…</Text>;
  if (unreadable)
    return (
      <Alert color="orange" variant="light" icon={<IconAlertTriangle aria-hidden />} title="Last observation not available" role="alert">
        The observations could not be read: check sedation and breathing at the bedside before the bolus.
      </Alert>
    );
  const open = flags.filter((flag) => flag.severity === 'urgent' && flag.acknowledgedAt === null).map((flag) => flag.code);
  const refusal = bolusSafetyRefusal({ lastSedation: observation?.sedationLevel ?? null, openUrgentFlagCodes: open });
  return (
    <>
      {observation ? (
        <Text size="lg" className="tabular-nums">
          Last observation {formatDateTime(observation.at)}: sedation {observation.sedationLevel} (
          {SEDATION_DESCRIPTIONS[observation.sedationLevel]}), respiratory rate {observation.respiratoryRate}/min, SpO2 {observation.spo2} %
        </Text>
      ) : (
        <Text size="lg">No observation recorded yet: check sedation and breathing before the bolus.</Text>
      )}
      {refusal ? (
        <Alert color="red" variant="filled" icon={<IconAlertTriangle aria-hidden />} title="Do not give a bolus now" role="alert">
          {refusal}
        </Alert>
      ) : null}
    </>
  );
}
