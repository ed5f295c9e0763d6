import { Badge } from '@mantine/core';
import { IconPlayerPause } from '@tabler/icons-react';

/** "Paused" as icon and word, for every place that shows a PCA's state. */
export function PausedBadge() {
  return (
    <Badge color="orange" size="lg" leftSection={<IconPlayerPause size={14} aria-hidden />}>
      Paused
    </Badge>
  );
}
