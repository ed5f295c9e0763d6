import { useMemo } from 'react';
import { Anchor, Group, Select, Stack, Text, Title } from '@mantine/core';
import { Link, useSearchParams } from 'react-router-dom';
import type { Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { useNow } from '@/hooks/use-now';
import { useOrders } from '@/api/orders/get-orders';
import { BEDSIDE_STATUSES } from '../utils/bedside-statuses';
import { byWardAndBed } from '../utils/order-sort';
import { BedsideCaution } from './bedside-caution';
import { BedsideOrdersTable } from './bedside-orders-table';

const ALL_WARDS = 'all';

export interface BedsideOrdersScreenProps {
  wards: readonly Ward[];
  wardsLoading: boolean;
}

function positiveId(value: string | null): number | undefined {
  const id = Number(value);
  return value && Number.isInteger(id) && id > 0 ? id : undefined;
}

/** The nurse's PCA orders: waiting for a bedside check, or running, on the chosen ward. */
export function BedsideOrdersScreen({ wards, wardsLoading }: BedsideOrdersScreenProps) {
  // Ward and patient live in the address, so "back" from a bedside task returns to the same list.
  const [searchParams, setSearchParams] = useSearchParams();
  const wardId = positiveId(searchParams.get('ward'));
  const patientId = positiveId(searchParams.get('patient'));

  // One request: each order comes with its syringe state and next observation. Asked again each time the list is shown.
  const ordersQuery = useOrders({ wardId, patientId, status: BEDSIDE_STATUSES }, { staleTime: 0 });
  const orders = useMemo(() => [...(ordersQuery.data ?? [])].sort(byWardAndBed), [ordersQuery.data]);
  const now = useNow(30_000);

  const wardOptions = [{ value: ALL_WARDS, label: 'All wards' }, ...wards.map((ward) => ({ value: String(ward.id), label: ward.name }))];
  const chooseWard = (value: string | null) => setSearchParams(value && value !== ALL_WARDS ? { ward: value } : {}, { replace: true });

  return (
    <Stack gap="md">
      <Title order={1}>PCA orders</Title>
      <Group gap="md" align="flex-end" wrap="wrap">
        <Select
          label="Ward"
          data={wardOptions}
          value={wardId ? String(wardId) : ALL_WARDS}
          onChange={chooseWard}
          allowDeselect={false}
          disabled={wardsLoading}
          w={220}
        />
        {patientId ? (
          <Text size="sm" pb={8}>
            Showing one patient’s PCA orders.{' '}
            <Anchor component={Link} to={paths.bedside.getHref({ wardId })}>
              Show the whole ward
            </Anchor>
          </Text>
        ) : null}
      </Group>
      {ordersQuery.isError ? (
        <QueryErrorAlert title="PCA orders could not be loaded" error={ordersQuery.error} onRetry={() => void ordersQuery.refetch()} />
      ) : (
        <BedsideOrdersTable
          orders={orders}
          now={now}
          isLoading={ordersQuery.isPending}
          emptyMessage="No PCA order here is waiting for a bedside check or running."
        />
      )}
      <BedsideCaution />
    </Stack>
  );
}
