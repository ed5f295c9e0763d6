import { Badge, type MantineSize } from '@mantine/core';
import { IconPlayerPause } from '@tabler/icons-react';

/** "Paused" as icon and word, for every place that shows a PCA's state. */
export function PausedBadge({ size = 'lg' }: { size?: MantineSize }) {
  return (
    <Badge color="orange" size={size} leftSection={<IconPlayerPause size={size === 'lg' || size === 'xl' ? 14 : 12} aria-hidden />}>
      Paused
    </Badge>
  );
}
