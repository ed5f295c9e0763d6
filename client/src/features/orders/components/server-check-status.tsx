import { Group, Loader, Text } from '@mantine/core';
import { IconAlertTriangle, IconCloudCheck, IconCloudOff, IconPencil } from '@tabler/icons-react';
import type { ServerCheck } from '../hooks/use-order-check';

const TEXT: Record<ServerCheck, string> = {
  waiting: 'Choose the drug and fill in the required amounts for the server to check them too.',
  checking: 'Checking with the server…',
  agrees: "The server's check agrees.",
  differs: "The server's check differs from this screen's: the server's findings are shown.",
  failed: 'The server could not be asked; the check on this screen still applies, and signing checks again.',
};

/** Whether the server has confirmed the check done on this screen. */
export function ServerCheckStatus({ status }: { status: ServerCheck }) {
  let icon;
  if (status === 'checking') icon = <Loader size={14} aria-hidden />;
  else if (status === 'agrees') icon = <IconCloudCheck size={16} color="var(--mantine-color-teal-7)" aria-hidden />;
  else if (status === 'differs') icon = <IconAlertTriangle size={16} color="var(--mantine-color-orange-7)" aria-hidden />;
  else if (status === 'failed') icon = <IconCloudOff size={16} color="var(--mantine-color-red-7)" aria-hidden />;
  else icon = <IconPencil size={16} aria-hidden />;
  return (
    <Group gap={6} wrap="nowrap" align="flex-start" data-server-check={status}>
      <span style={{ marginTop: 2, display: 'inline-flex' }}>{icon}</span>
      <Text size="xs" c="dimmed">
        {TEXT[status]}
      </Text>
    </Group>
  );
}
