import { Badge, Stack, Text, Tooltip } from '@mantine/core';
import {
  CONSCIOUSNESS_LABELS,
  formatDose,
  NEWS2_RESPONSE_WORDS,
  OXYGEN_DEVICE_LABELS,
  type News2Parameter,
  type ObservationResponse,
} from '@lockstep/shared';

const PARAMETER_LABELS: Record<News2Parameter, string> = {
  respiration: 'Resp.',
  spo2: 'SpO2',
  airOrOxygen: 'Air/O2',
  systolicBp: 'BP',
  pulse: 'Pulse',
  consciousness: 'ACVPU',
  temperature: 'Temp.',
};

const RESPONSE_COLOURS = { low: 'gray', 'low-medium': 'orange', medium: 'red', high: 'red' } as const;

/** Oxygen and the optional vitals of one observation, in words. */
export function VitalsCell({ observation }: { observation: ObservationResponse }) {
  const litres = observation.oxygenLitresPerMinute;
  const parts = [
    litres === null
      ? null
      : litres === 0
        ? 'Air'
        : `O2 ${formatDose(litres, 'L/min')}${observation.oxygenDevice ? ` (${OXYGEN_DEVICE_LABELS[observation.oxygenDevice]})` : ''}`,
    observation.heartRate === null ? null : `HR ${observation.heartRate}/min`,
    observation.systolicBp === null ? null : `BP ${observation.systolicBp} systolic`,
    observation.temperatureC === null ? null : `${formatDose(observation.temperatureC, '°C')}`,
    observation.consciousness === null ? null : CONSCIOUSNESS_LABELS[observation.consciousness],
  ].filter((part): part is string => part !== null);
  return parts.length === 0 ? <Text c="dimmed">—</Text> : <Text size="sm">{parts.join(', ')}</Text>;
}

/** The NEWS2 score with each parameter's score, or why it was not scored. */
export function News2Cell({ observation }: { observation: ObservationResponse }) {
  const score = observation.news2;
  if (!score) {
    return (
      <Text size="xs" c="dimmed">
        {observation.news2NotScored ?? 'Not scored'}
      </Text>
    );
  }
  const breakdown = (Object.keys(PARAMETER_LABELS) as News2Parameter[])
    .map((key) => `${PARAMETER_LABELS[key]} ${score.parameters[key]}`)
    .join(', ');
  return (
    <Stack gap={2}>
      <Tooltip label={NEWS2_RESPONSE_WORDS[score.response]} multiline w={260}>
        <Badge color={RESPONSE_COLOURS[score.response]} variant={score.response === 'low' ? 'light' : 'filled'}>
          NEWS2 {score.total}
          {score.response === 'high' ? ': emergency' : score.response === 'low' ? '' : ': urgent'}
        </Badge>
      </Tooltip>
      <Text size="xs" c="dimmed">
        {breakdown}
      </Text>
    </Stack>
  );
}
