import { useState, type ReactNode } from 'react';
import { Button, Skeleton, Stack } from '@mantine/core';
import { IconClipboardCheck, IconPackageExport, IconPencil, IconSquareX } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { canCancel, type OrderDetail } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { isApiRequestError } from '@/lib/api-error';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useOrder } from '@/api/orders/get-order';
import { CancelOrderModal } from './cancel-order-modal';
import { OrderHeader } from './order-header';
import { OrderReview } from './order-review';
import { ReleaseModal } from './release-modal';

export interface OrderDetailScreenProps {
  orderId: number;
  /** The patient's weight, for amounts per kg; null while unknown. */
  weightKg: number | null;
  patientBanner: ReactNode;
  /** Everything that happened to the order, from the audit feature. */
  story?: ReactNode;
}

/** Releases are for verified or active orders (the server says the same). */
export function isReleasable(order: Pick<OrderDetail, 'status'>): boolean {
  return order.status === 'verified' || order.status === 'active';
}

export function OrderLoading() {
  return (
    <Stack gap="md" aria-busy aria-label="Loading order">
      <Skeleton height={32} width="40%" />
      <Skeleton height={120} />
      <Skeleton height={320} />
    </Stack>
  );
}

/** One order for any clinical role, with the actions the signed-in role may take on it. */
export function OrderDetailScreen({ orderId, weightKg, patientBanner, story }: OrderDetailScreenProps) {
  const user = useCurrentUser();
  const orderQuery = useOrder(orderId);
  const previousQuery = useOrder(orderQuery.data?.supersedesId ?? null);
  const [modal, setModal] = useState<'cancel' | 'release' | null>(null);

  if (orderQuery.isPending) return <OrderLoading />;
  if (orderQuery.isError) {
    const notFound = isApiRequestError(orderQuery.error) && orderQuery.error.status === 404;
    return (
      <QueryErrorAlert
        title={notFound ? 'Order not found' : 'The order could not be loaded'}
        error={orderQuery.error}
        onRetry={notFound ? undefined : () => void orderQuery.refetch()}
      />
    );
  }
  const order = orderQuery.data;
  const pharmacist = user.role === 'pharmacist';
  const prescriber = user.role === 'prescriber';

  const actions: ReactNode[] = [];
  if (prescriber && order.status === 'returned') {
    actions.push(
      <Button key="revise" component={Link} to={paths.reviseOrder.getHref(order.id)} leftSection={<IconPencil size={16} aria-hidden />}>
        Revise
      </Button>,
    );
  }
  if (prescriber && canCancel(order.status)) {
    actions.push(
      <Button key="cancel" variant="default" leftSection={<IconSquareX size={16} aria-hidden />} onClick={() => setModal('cancel')}>
        Cancel order
      </Button>,
    );
  }
  if (pharmacist && order.status === 'awaiting_verification') {
    actions.push(
      <Button
        key="verify"
        component={Link}
        to={paths.verification.getHref(order.id)}
        leftSection={<IconClipboardCheck size={16} aria-hidden />}
      >
        Open in verification
      </Button>,
    );
  }
  const releaseAction =
    pharmacist && isReleasable(order) ? (
      <Button leftSection={<IconPackageExport size={16} aria-hidden />} onClick={() => setModal('release')}>
        Release syringe
      </Button>
    ) : undefined;

  return (
    <Stack gap="md">
      <OrderHeader order={order} title={`PCA order ${order.id}`} actions={actions.length > 0 ? actions : undefined} />
      {patientBanner}
      <OrderReview
        order={order}
        previous={previousQuery.data ?? null}
        weightKg={weightKg}
        canPrint={pharmacist}
        releaseAction={releaseAction}
        story={story}
      />
      {modal === 'cancel' ? <CancelOrderModal order={order} onClose={() => setModal(null)} /> : null}
      {modal === 'release' ? <ReleaseModal order={order} onClose={() => setModal(null)} /> : null}
    </Stack>
  );
}
