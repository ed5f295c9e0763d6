import type { ComponentType } from 'react';
import { Group, Text } from '@mantine/core';
import { IconPlugConnected, IconPlugConnectedX, IconRefresh, type IconProps } from '@tabler/icons-react';
import { formatClockSeconds } from '@/utils/clock';
import type { StreamStatus } from '../api/ward-stream';

const STATUS_LOOK: Record<StreamStatus, { word: string; color: string; icon: ComponentType<IconProps>; hint: string }> = {
  connecting: { word: 'Connecting', color: 'slate.7', icon: IconRefresh, hint: 'Opening the live connection' },
  live: { word: 'Connected', color: 'teal.8', icon: IconPlugConnected, hint: 'Changes on the ward appear within seconds' },
  reconnecting: {
    word: 'Reconnecting',
    color: 'orange.9',
    icon: IconRefresh,
    hint: 'The board may be behind; it refreshes once the connection is back',
  },
  stopped: { word: 'Not live', color: 'red.8', icon: IconPlugConnectedX, hint: 'Live updates are off; the board refreshes every minute' },
};

export interface LiveIndicatorProps {
  status: StreamStatus;
  /** When the shown board was generated (the server's time). */
  updatedAt: string | null;
}

/** The connection as icon + word, and when the board was last brought up to date. */
export function LiveIndicator({ status, updatedAt }: LiveIndicatorProps) {
  const look = STATUS_LOOK[status];
  const Icon = look.icon;
  return (
    <Group gap="sm" wrap="nowrap">
      <Group gap={4} wrap="nowrap" c={look.color} role="status" title={look.hint}>
        <Icon size={16} aria-hidden />
        <Text size="sm" fw={600} c="inherit">
          {look.word}
        </Text>
      </Group>
      {updatedAt ? (
        <Text size="sm" c="dimmed" className="tabular-nums" data-testid="board-updated">
          Updated {formatClockSeconds(updatedAt)}
        </Text>
      ) : null}
    </Group>
  );
}
