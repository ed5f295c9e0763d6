import type { ReactNode } from 'react';
import { Group, Paper, Stack, Text } from '@mantine/core';
import { FLAG_SEVERITY_LABELS, type FlagResponse } from '@lockstep/shared';
import { SeverityBadge } from '@/components/ui/severity-badge';
import { SEVERITY_LOOK } from '@/components/ui/severity-look';
import { formatDateTime } from '@/utils/format-date';

export interface FlagCardProps {
  flag: Pick<FlagResponse, 'severity' | 'message' | 'action'> & Partial<Pick<FlagResponse, 'raisedAt'>>;
  /** "Acknowledge", or who acknowledged it. */
  footer?: ReactNode;
  /** A flag raised just now is announced to screen readers. */
  announce?: boolean;
  /** An acknowledged flag: the severity still shows, without the tinted background. */
  muted?: boolean;
}

/** One flag: severity as icon + word + colour, what happened, and what to do. */
export function FlagCard({ flag, footer, announce, muted }: FlagCardProps) {
  const { color } = SEVERITY_LOOK[flag.severity];
  return (
    <Paper
      withBorder
      radius="md"
      p="md"
      role={announce ? 'alert' : 'group'}
      aria-label={`${FLAG_SEVERITY_LABELS[flag.severity]} flag: ${flag.message}`}
      style={{
        borderLeft: `6px solid var(--mantine-color-${color}-filled)`,
        background: muted ? undefined : `var(--mantine-color-${color}-light)`,
      }}
    >
      <Stack gap={6}>
        <Group justify="space-between" gap="sm" wrap="wrap">
          <Group gap="sm" wrap="wrap">
            <SeverityBadge severity={flag.severity} size="lg" />
            <Text fw={600} className="tabular-nums">
              {flag.message}
            </Text>
          </Group>
          {flag.raisedAt ? (
            <Text size="sm" c="dimmed">
              Raised {formatDateTime(flag.raisedAt)}
            </Text>
          ) : null}
        </Group>
        <Text size="sm">
          <Text span fw={600} inherit>
            Action:{' '}
          </Text>
          {flag.action}
        </Text>
        {footer}
      </Stack>
    </Paper>
  );
}
