import { useMemo } from 'react';
import { Stack, Text, Title } from '@mantine/core';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useNow } from '@/hooks/use-now';
import { useOrders } from '@/api/orders/get-orders';
import { observationsDue } from '@/utils/order-alerts';
import { BedsideCaution } from './bedside-caution';
import { BedsideOrdersTable } from './bedside-orders-table';

/** The running PCAs by when their next observation is due, overdue first: the nurse's round. */
export function ObservationsDueScreen() {
  // The same list and schedule as the PCA orders screen; asked again each time it is shown and every minute.
  const ordersQuery = useOrders({ status: ['active'] }, { staleTime: 0, refetchInterval: 60_000 });
  const orders = useMemo(() => observationsDue(ordersQuery.data ?? []), [ordersQuery.data]);
  const now = useNow(30_000);
  return (
    <Stack gap="md">
      <Title order={1}>Observations due</Title>
      <Text size="sm" c="dimmed">
        Running PCAs, the next observation soonest first. Observations tighten to every 15 minutes after a start, a change or an urgent
        flag, by the ward’s policy.
      </Text>
      {ordersQuery.isError ? (
        <QueryErrorAlert
          title="Observations due could not be loaded"
          error={ordersQuery.error}
          onRetry={() => void ordersQuery.refetch()}
        />
      ) : (
        <BedsideOrdersTable orders={orders} now={now} isLoading={ordersQuery.isPending} emptyMessage="No PCA is running." />
      )}
      <BedsideCaution />
    </Stack>
  );
}
