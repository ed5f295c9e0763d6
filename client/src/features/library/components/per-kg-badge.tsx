import { Badge } from '@mantine/core';
import { IconWeight } from '@tabler/icons-react';

/** Marks a weight-based rule: its dose limits are per kg of body weight. */
export function PerKgBadge() {
  return (
    <Badge
      color="grape"
      variant="light"
      size="sm"
      leftSection={<IconWeight size={12} aria-hidden />}
      title="Dose limits are per kg of body weight"
    >
      per kg
    </Badge>
  );
}
