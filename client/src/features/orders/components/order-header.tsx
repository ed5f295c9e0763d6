import type { ReactNode } from 'react';
import { Alert, Anchor, Group, Stack, Text, Title } from '@mantine/core';
import { IconArrowBackUp, IconBan, IconSquareX } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { REGIMEN_TYPE_LABELS, type OrderDetail } from '@lockstep/shared';
import { OrderStatusBadge } from '@/components/ui/order-status-badge';
import { PausedBadge } from '@/components/ui/paused-badge';
import { paths } from '@/config/paths';
import { formatCalendarDate, formatDateTime } from '@/utils/format-date';

const REASON_LOOK = {
  returned: { title: "Pharmacist's query", color: 'grape', Icon: IconArrowBackUp },
  rejected: { title: 'Rejected by pharmacy', color: 'red', Icon: IconBan },
  cancelled: { title: 'Cancelled', color: 'gray', Icon: IconSquareX },
} as const;

export interface OrderHeaderProps {
  order: OrderDetail;
  /** The page's title, e.g. "PCA order 14" or "Verify order 14". */
  title: string;
  actions?: ReactNode;
}

/** The order's title, status (and Paused, while a running PCA is paused), who signed and verified it, and why it was returned or ended. */
export function OrderHeader({ order, title, actions }: OrderHeaderProps) {
  const reasonLook =
    order.status === 'returned' || order.status === 'rejected' || order.status === 'cancelled' ? REASON_LOOK[order.status] : null;
  return (
    <Stack gap="sm">
      <Group justify="space-between" align="flex-start" wrap="wrap">
        <Stack gap={4}>
          <Group gap="sm" align="center">
            <Title order={1}>{title}</Title>
            <OrderStatusBadge status={order.status} size="lg" />
            {order.paused ? <PausedBadge /> : null}
          </Group>
          <Text size="sm" c="dimmed" className="tabular-nums">
            Version {order.version} · {REGIMEN_TYPE_LABELS[order.regimenType]} · signed by {order.prescriberName},{' '}
            {formatDateTime(order.signedAt)}
            {order.verifiedByName && order.verifiedAt
              ? ` · verified by ${order.verifiedByName}, ${formatDateTime(order.verifiedAt)}`
              : ''}{' '}
            · review {formatCalendarDate(order.reviewDate)}
          </Text>
          {order.supersedesId !== null ? (
            <Text size="sm">
              Revises{' '}
              <Anchor component={Link} to={paths.order.getHref(order.supersedesId)}>
                order {order.supersedesId}
              </Anchor>
            </Text>
          ) : null}
        </Stack>
        {actions ? <Group gap="sm">{actions}</Group> : null}
      </Group>
      {reasonLook && order.statusReason ? (
        <Alert color={reasonLook.color} variant="light" icon={<reasonLook.Icon aria-hidden />} title={reasonLook.title}>
          <Text size="sm" data-testid="status-reason">
            {order.statusReason}
          </Text>
        </Alert>
      ) : null}
    </Stack>
  );
}
