import { Group, Stack, Text } from '@mantine/core';
import type { DiscontinueResponse } from '@lockstep/shared';
import { OrderStatusBadge } from '@/components/ui/order-status-badge';
import { formatDateTime } from '@/utils/format-date';
import { BackToOrdersButton } from './back-to-orders-button';
import { DonePanel } from './done-panel';
import { ReconciliationSummary } from './reconciliation-summary';

/** The PCA has ended: its status, the last syringe's reconciliation and any flag for pharmacy. */
export function DiscontinuedResult({ done }: { done: DiscontinueResponse }) {
  const { order, reconciliation } = done;
  return (
    <DonePanel number={3} title="PCA discontinued">
      <Stack gap="lg">
        <Group gap="xs">
          <Text>Order status:</Text>
          <OrderStatusBadge status={order.status} size="lg" />
          <Text c="dimmed" className="tabular-nums">
            since {formatDateTime(order.statusChangedAt)}
          </Text>
        </Group>
        <ReconciliationSummary reconciliation={reconciliation} flags={order.flags} />
        <Group>
          <BackToOrdersButton wardId={order.wardId} />
        </Group>
      </Stack>
    </DonePanel>
  );
}
