import { Button, Group, Stack, Title } from '@mantine/core';
import { IconPlus } from '@tabler/icons-react';
import { Link, useNavigate } from 'react-router-dom';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useOrders } from '@/api/orders/get-orders';
import { OrdersTable } from './orders-table';

/** The patient page's PCA orders, newest first, and the way to write a new one. */
export function PatientOrders({ patientId }: { patientId: number }) {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const ordersQuery = useOrders({ patientId });
  return (
    <Stack gap="xs" component="section" aria-labelledby="patient-orders-title">
      <Group justify="space-between" align="center">
        <Title order={2} id="patient-orders-title">
          PCA orders
        </Title>
        {user.role === 'prescriber' ? (
          <Button component={Link} to={paths.newOrder.getHref(patientId)} leftSection={<IconPlus size={16} aria-hidden />}>
            New PCA order
          </Button>
        ) : null}
      </Group>
      {ordersQuery.isError ? (
        <QueryErrorAlert title="PCA orders could not be loaded" error={ordersQuery.error} onRetry={() => void ordersQuery.refetch()} />
      ) : (
        <OrdersTable
          orders={ordersQuery.data ?? []}
          label="PCA orders for this patient"
          isLoading={ordersQuery.isPending}
          empty="No PCA order has been written for this patient."
          showPatient={false}
          onOpen={(order) => navigate(paths.order.getHref(order.id))}
        />
      )}
    </Stack>
  );
}
