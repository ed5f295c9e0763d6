import type { ComponentType } from 'react';
import { Badge, type BadgeProps } from '@mantine/core';
import type { IconProps } from '@tabler/icons-react';

export interface StatusLook {
  Icon: ComponentType<IconProps>;
  color: string;
}

export interface StatusBadgeProps {
  look: StatusLook;
  label: string;
  size?: BadgeProps['size'];
}

/** A status as icon, word and colour: never colour alone. */
export function StatusBadge({ look: { Icon, color }, label, size = 'sm' }: StatusBadgeProps) {
  return (
    <Badge
      color={color}
      variant="light"
      size={size}
      leftSection={<Icon size={size === 'sm' || size === 'xs' ? 12 : 14} aria-hidden />}
      // The status is read in full, never cut to "Returned with a q…".
      style={{ flexShrink: 0, overflow: 'visible' }}
      styles={{ label: { overflow: 'visible' } }}
    >
      {label}
    </Badge>
  );
}
