import type { ComponentType } from 'react';
import { Badge } from '@mantine/core';
import { IconArrowDownRight, IconArrowsExchange, IconArrowUpRight, IconMinus, IconPlus, type IconProps } from '@tabler/icons-react';
import type { ChangeDirection } from '../utils/diff-rows';

const DIRECTION_LOOK: Record<ChangeDirection, { Icon: ComponentType<IconProps>; label: string; color: string }> = {
  raised: { Icon: IconArrowUpRight, label: 'Raised', color: 'orange' },
  lowered: { Icon: IconArrowDownRight, label: 'Lowered', color: 'blue' },
  set: { Icon: IconPlus, label: 'Newly set', color: 'teal' },
  cleared: { Icon: IconMinus, label: 'Removed', color: 'red' },
  switched: { Icon: IconArrowsExchange, label: 'Changed', color: 'grape' },
};

/** How one limit moved, as icon and word. */
export function ChangeDirectionBadge({ direction }: { direction: ChangeDirection }) {
  const { Icon, label, color } = DIRECTION_LOOK[direction];
  return (
    <Badge color={color} variant="light" size="sm" leftSection={<Icon size={12} aria-hidden />}>
      {label}
    </Badge>
  );
}
