import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { IconLogout } from '@tabler/icons-react';
import { formatCountdown } from '../utils/idle-timer';

export interface IdleWarningModalProps {
  opened: boolean;
  msLeft: number;
  /** How long the tab has gone unused, in words ("14 minutes"). */
  idleFor: string;
  onStay: () => void;
  onSignOut: () => void;
}

/**
 * The minute's warning before an idle sign-out. A dialog with a title and a description, so a
 * screen reader announces both when focus moves to "Stay signed in"; closing it in any way
 * (Escape, the close button, a click outside) is someone at the computer, so it stays signed in.
 */
export function IdleWarningModal({ opened, msLeft, idleFor, onStay, onSignOut }: IdleWarningModalProps) {
  return (
    <Modal opened={opened} onClose={onStay} title="Are you still there?" centered zIndex={400}>
      <Stack gap="md">
        <Text size="sm">
          Nobody has used Lockstep in this window for {idleFor}. On a shared ward computer it signs out by itself to keep patients' records
          private.
        </Text>
        <Text size="sm">
          Signing out in{' '}
          <Text span fw={700} fz="lg" className="tabular-nums" data-testid="idle-countdown">
            {formatCountdown(msLeft)}
          </Text>
        </Text>
        <Group justify="flex-end" gap="sm">
          <Button variant="default" leftSection={<IconLogout size={16} aria-hidden />} onClick={onSignOut}>
            Sign out now
          </Button>
          <Button onClick={onStay} data-autofocus>
            Stay signed in
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
