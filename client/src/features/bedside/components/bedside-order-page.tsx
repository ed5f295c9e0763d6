import type { ReactNode } from 'react';
import { Anchor, Group, Skeleton, Stack, Title } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { OrderDetail } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { isApiRequestError } from '@/lib/api-error';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useOrder } from '@/api/orders/get-order';
import { bedsideListWard } from '../utils/ward-choice';
import { BedsideCaution } from './bedside-caution';
import { OrderContext } from './order-context';

export interface BedsideOrderPageProps {
  orderId: number;
  title: string;
  /** Shows the ordered regimen beside the patient (never during a bedside check). */
  showRegimen?: boolean;
  children: (order: OrderDetail) => ReactNode;
}

/** The frame of every bedside task: the way back, the task's name, whose order it is, the caution. */
export function BedsideOrderPage({ orderId, title, showRegimen, children }: BedsideOrderPageProps) {
  // At the bedside the status and syringe must be current: always ask again on opening.
  const orderQuery = useOrder(orderId, { staleTime: 0 });
  const order = orderQuery.data;
  const ownWardIds = useCurrentUser().wards.map((ward) => ward.id);

  let body: ReactNode;
  if (order) {
    body = (
      <>
        <OrderContext order={order} showRegimen={showRegimen} />
        {children(order)}
      </>
    );
  } else if (orderQuery.isError) {
    const notFound = isApiRequestError(orderQuery.error) && orderQuery.error.status === 404;
    body = (
      <QueryErrorAlert
        title={notFound ? 'Order not found' : 'The order could not be loaded'}
        error={orderQuery.error}
        onRetry={notFound ? undefined : () => void orderQuery.refetch()}
      />
    );
  } else {
    body = (
      <Stack gap="md" aria-busy aria-label="Loading the order">
        <Skeleton height={84} />
        <Skeleton height={320} />
      </Stack>
    );
  }

  return (
    <Stack gap="lg" maw={1100}>
      <Anchor component={Link} to={paths.bedside.getHref({ wardId: bedsideListWard(order?.wardId, ownWardIds) })} size="sm">
        <Group gap={4} component="span">
          <IconArrowLeft size={16} aria-hidden />
          Back to PCA orders
        </Group>
      </Anchor>
      <Title order={1}>{title}</Title>
      {body}
      <BedsideCaution />
    </Stack>
  );
}
