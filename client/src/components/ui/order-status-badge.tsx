import type { BadgeProps } from '@mantine/core';
import {
  IconArrowBackUp,
  IconBan,
  IconCircleCheck,
  IconCircleOff,
  IconHourglassHigh,
  IconPlayerPlay,
  IconSquareX,
  IconVersions,
} from '@tabler/icons-react';
import { ORDER_STATUS_LABELS, type OrderStatus } from '@lockstep/shared';
import { StatusBadge, type StatusLook } from './status-badge';

const STATUS_LOOK: Record<OrderStatus, StatusLook> = {
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
export function OrderStatusBadge({ status, size }: { status: OrderStatus; size?: BadgeProps['size'] }) {
  return <StatusBadge look={STATUS_LOOK[status]} label={ORDER_STATUS_LABELS[status]} size={size} />;
}
