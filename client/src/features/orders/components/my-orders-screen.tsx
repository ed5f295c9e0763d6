import { useMemo, useState } from 'react';
import { Alert, SegmentedControl, Stack, Text, Title } from '@mantine/core';
import { IconArrowBackUp } from '@tabler/icons-react';
import { useNavigate } from 'react-router-dom';
import { OPEN_ORDER_STATUSES, type OrderSummary } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { useOrders } from '@/api/orders/get-orders';
import { CancelOrderModal } from './cancel-order-modal';
import { OrdersTable } from './orders-table';

type Shown = 'open' | 'all';

/** The prescriber's own orders: what pharmacy returned with a query first in mind, revise or cancel. */
export function MyOrdersScreen() {
  const navigate = useNavigate();
  const [shown, setShown] = useState<Shown>('open');
  const [cancelling, setCancelling] = useState<OrderSummary | null>(null);
  const ordersQuery = useOrders({ mine: true, status: shown === 'open' ? OPEN_ORDER_STATUSES : undefined });
  const orders = useMemo(() => ordersQuery.data ?? [], [ordersQuery.data]);
  const returned = orders.filter((order) => order.status === 'returned').length;
  const actions = useMemo(
    () => ({ onRevise: (order: OrderSummary) => navigate(paths.reviseOrder.getHref(order.id)), onCancel: setCancelling }),
    [navigate],
  );

  return (
    <Stack gap="md">
      <Title order={1}>My orders</Title>
      {returned > 0 ? (
        <Alert
          color="grape"
          variant="light"
          icon={<IconArrowBackUp aria-hidden />}
          title={`${returned} ${returned === 1 ? 'order' : 'orders'} returned with a query`}
        >
          <Text size="sm">Read the pharmacist&apos;s query, then revise and sign the order again, or cancel it.</Text>
        </Alert>
      ) : null}
      <SegmentedControl
        value={shown}
        onChange={(value) => setShown(value === 'all' ? 'all' : 'open')}
        data={[
          { value: 'open', label: 'Open orders' },
          { value: 'all', label: 'All my orders' },
        ]}
        aria-label="Orders shown"
        w="fit-content"
      />
      {ordersQuery.isError ? (
        <QueryErrorAlert title="Your orders could not be loaded" error={ordersQuery.error} onRetry={() => void ordersQuery.refetch()} />
      ) : (
        <OrdersTable
          orders={orders}
          label="My orders"
          isLoading={ordersQuery.isPending}
          empty={shown === 'open' ? 'You have no open PCA orders.' : 'You have not signed any PCA orders.'}
          showPatient
          onOpen={(order) => navigate(paths.order.getHref(order.id))}
          actions={actions}
        />
      )}
      {cancelling ? <CancelOrderModal order={cancelling} onClose={() => setCancelling(null)} /> : null}
    </Stack>
  );
}
