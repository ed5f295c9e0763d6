import { Badge } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/** A limit changed by a factor of 2 or more, or to or from no limit: icon and words, not colour alone. */
export function LargeChangeBadge({ change }: { change: string }) {
  return (
    <Badge color="red" variant="light" size="sm" leftSection={<IconAlertTriangle size={12} aria-hidden />} data-large-change>
      Large change {change}
    </Badge>
  );
}
