import { useState } from 'react';
import { Button, Collapse, Group, Paper, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconChevronDown, IconChevronRight, IconCircleCheck } from '@tabler/icons-react';
import type { FlagResponse } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { splitFlags } from '../utils/flags';
import { AcknowledgeFlagModal } from './acknowledge-flag-modal';
import { FlagCard } from './flag-card';

export interface FlagsPanelProps {
  orderId: number;
  flags: readonly FlagResponse[];
}

/** Open flags first and in full, each with "Acknowledge"; acknowledged ones folded away below. */
export function FlagsPanel({ orderId, flags }: FlagsPanelProps) {
  const { open, acknowledged } = splitFlags(flags);
  const [acknowledging, setAcknowledging] = useState<FlagResponse | null>(null);
  const [showDone, setShowDone] = useState(false);

  return (
    <Stack gap="sm" component="section" aria-labelledby="pca-flags-heading">
      <Title order={2} id="pca-flags-heading">
        {open.length === 0 ? 'Flags' : `Open flags (${open.length})`}
      </Title>
      {open.length === 0 ? (
        <Paper withBorder radius="md" p="sm">
          <Group gap="xs">
            <ThemeIcon color="teal" variant="light" radius="xl" size="md">
              <IconCircleCheck size={18} aria-hidden />
            </ThemeIcon>
            <Text size="sm">No open flags.</Text>
          </Group>
        </Paper>
      ) : (
        open.map((flag) => (
          <FlagCard
            key={flag.id}
            flag={flag}
            footer={
              <Group justify="flex-end">
                <Button size="sm" onClick={() => setAcknowledging(flag)} aria-label={`Acknowledge: ${flag.message}`}>
                  Acknowledge
                </Button>
              </Group>
            }
          />
        ))
      )}

      {acknowledged.length > 0 ? (
        <div>
          <Button
            variant="subtle"
            size="compact-sm"
            leftSection={showDone ? <IconChevronDown size={16} aria-hidden /> : <IconChevronRight size={16} aria-hidden />}
            onClick={() => setShowDone((shown) => !shown)}
            aria-expanded={showDone}
            aria-controls="pca-acknowledged-flags"
          >
            {acknowledged.length === 1 ? '1 acknowledged flag' : `${acknowledged.length} acknowledged flags`}
          </Button>
          <Collapse expanded={showDone} id="pca-acknowledged-flags">
            <Stack gap="xs" mt="xs">
              {acknowledged.map((flag) => (
                <FlagCard
                  key={flag.id}
                  flag={flag}
                  muted
                  footer={
                    <Text size="sm" c="dimmed">
                      Acknowledged by {flag.acknowledgedByName ?? 'someone'}
                      {flag.acknowledgedAt ? `, ${formatDateTime(flag.acknowledgedAt)}` : ''}: {flag.acknowledgeNote}
                    </Text>
                  }
                />
              ))}
            </Stack>
          </Collapse>
        </div>
      ) : null}

      <AcknowledgeFlagModal orderId={orderId} flag={acknowledging} onClose={() => setAcknowledging(null)} />
    </Stack>
  );
}
