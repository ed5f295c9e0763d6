import type { ComponentType } from 'react';
import { Badge, type BadgeProps } from '@mantine/core';
import {
  IconArrowBackUp,
  IconBan,
  IconCircleCheck,
  IconCircleOff,
  IconHourglassHigh,
  IconPlayerPlay,
  IconSquareX,
  IconVersions,
  type IconProps,
} from '@tabler/icons-react';
import { ORDER_STATUS_LABELS, type OrderStatus } from '@lockstep/shared';

const STATUS_LOOK: Record<OrderStatus, { Icon: ComponentType<IconProps>; color: string }> = {
  awaiting_verification: { Icon: IconHourglassHigh, color: 'orange' },
  verified: { Icon: IconCircleCheck, color: 'teal' },
  active: { Icon: IconPlayerPlay, color: 'green' },
  discontinued: { Icon: IconCircleOff, color: 'gray' },
  returned: { Icon: IconArrowBackUp, color: 'grape' },
  rejected: { Icon: IconBan, color: 'red' },
  cancelled: { Icon: IconSquareX, color: 'gray' },
  superseded: { Icon: IconVersions, color: 'gray' },
};

/** An order's status as icon, word and colour. */
export function OrderStatusBadge({ status, size = 'sm' }: { status: OrderStatus; size?: BadgeProps['size'] }) {
  const { Icon, color } = STATUS_LOOK[status];
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
      {ORDER_STATUS_LABELS[status]}
    </Badge>
  );
}
