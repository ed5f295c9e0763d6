import { Group, Paper, Text, ThemeIcon } from '@mantine/core';
import { IconClockCheck } from '@tabler/icons-react';
import type { ObservationDue } from '@lockstep/shared';
import { describeNextObservation } from '@/utils/next-observation';
import { SeverityBadge } from '@/components/ui/severity-badge';

/** When the next observation is due; overdue is shown as review or urgent, with icon and word. */
export function NextObservation({ due, now }: { due: ObservationDue; now: Date }) {
  const state = describeNextObservation(due, now);
  return (
    <Paper withBorder radius="md" p="md" component="section" aria-label="Next observation">
      <Text size="sm" c="dimmed" mb={4}>
        Next observation
      </Text>
      <Group gap="sm" wrap="wrap">
        {state.tone === 'ok' ? (
          <ThemeIcon color="teal" variant="light" radius="xl">
            <IconClockCheck size={18} aria-hidden />
          </ThemeIcon>
        ) : (
          <SeverityBadge severity={state.tone} size="lg" />
        )}
        <Text fz="lg" fw={700} className="tabular-nums" data-testid="next-observation">
          {state.headline}
        </Text>
        <Text c="dimmed" className="tabular-nums">
          {state.detail}
        </Text>
      </Group>
    </Paper>
  );
}
