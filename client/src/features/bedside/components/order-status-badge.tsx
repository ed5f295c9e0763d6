import type { ComponentType } from 'react';
import { Badge, type BadgeProps } from '@mantine/core';
import { IconCircleCheck, IconCircleDashed, IconCircleX, IconClipboardCheck, type IconProps } from '@tabler/icons-react';
import { ORDER_STATUS_LABELS, type OrderStatus } from '@lockstep/shared';

const STATUS_LOOK: Partial<Record<OrderStatus, { color: string; icon: ComponentType<IconProps> }>> = {
  verified: { color: 'blue', icon: IconClipboardCheck },
  active: { color: 'teal', icon: IconCircleCheck },
  discontinued: { color: 'gray', icon: IconCircleX },
};

/** An order's status: icon and word as well as colour. */
export function OrderStatusBadge({ status, ...props }: { status: OrderStatus } & BadgeProps) {
  const look = STATUS_LOOK[status] ?? { color: 'gray', icon: IconCircleDashed };
  const Icon = look.icon;
  return (
    <Badge color={look.color} variant="light" leftSection={<Icon size={14} aria-hidden />} {...props}>
      {ORDER_STATUS_LABELS[status]}
    </Badge>
  );
}
