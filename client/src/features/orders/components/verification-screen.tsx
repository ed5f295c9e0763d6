import { useState, type ReactNode } from 'react';
import { Alert, Button, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconArrowBackUp, IconBan, IconCircleCheck, IconPackageExport } from '@tabler/icons-react';
import { useNavigate } from 'react-router-dom';
import { ORDER_STATUS_LABELS } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { isApiRequestError } from '@/lib/api-error';
import { useOrder } from '@/api/orders/get-order';
import { isReleasable, OrderLoading } from './order-detail-screen';
import { OrderHeader } from './order-header';
import { OrderReview } from './order-review';
import { OtherOpioidOrdersAlert } from './other-opioid-orders';
import { ReleaseModal } from './release-modal';
import { VerificationDecision, type Decision } from './verification-decisions';

export interface VerificationScreenProps {
  orderId: number;
  weightKg: number | null;
  /** The patient's factors: weight, age, tolerance, sleep apnoea, other sedatives, allergies. */
  patientBanner: ReactNode;
}

/** One order under pharmacy review: beside its rule and the patient, then verify, return or reject. */
export function VerificationScreen({ orderId, weightKg, patientBanner }: VerificationScreenProps) {
  const navigate = useNavigate();
  const orderQuery = useOrder(orderId);
  const previousQuery = useOrder(orderQuery.data?.supersedesId ?? null);
  const [decision, setDecision] = useState<Decision | null>(null);
  const [releasing, setReleasing] = useState(false);
  const [conflict, setConflict] = useState(false);

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
  const awaiting = order.status === 'awaiting_verification';

  const actions = awaiting ? (
    <>
      <Button leftSection={<IconCircleCheck size={16} aria-hidden />} onClick={() => setDecision('verify')}>
        Verify
      </Button>
      <Button variant="default" leftSection={<IconArrowBackUp size={16} aria-hidden />} onClick={() => setDecision('return')}>
        Return with query
      </Button>
      <Button variant="light" color="red" leftSection={<IconBan size={16} aria-hidden />} onClick={() => setDecision('reject')}>
        Reject
      </Button>
    </>
  ) : isReleasable(order) ? (
    <Button leftSection={<IconPackageExport size={16} aria-hidden />} onClick={() => setReleasing(true)}>
      Release syringe
    </Button>
  ) : undefined;

  return (
    <Stack gap="md">
      <OrderHeader order={order} title={`Verify order ${order.id}`} actions={actions} />
      {conflict ? (
        <Alert color="orange" variant="light" icon={<IconAlertTriangle aria-hidden />} title="Already handled by someone else" role="alert">
          <Text size="sm">
            Another pharmacist decided on this order first. It is now: <strong>{ORDER_STATUS_LABELS[order.status]}</strong>.
          </Text>
        </Alert>
      ) : null}
      {!awaiting && !conflict ? (
        <Text size="sm" c="dimmed">
          This order is not awaiting verification: it is {ORDER_STATUS_LABELS[order.status].toLowerCase()}.
        </Text>
      ) : null}
      {patientBanner}
      {awaiting ? <OtherOpioidOrdersAlert orderId={order.id} patientId={order.patientId} /> : null}
      <OrderReview order={order} previous={previousQuery.data ?? null} weightKg={weightKg} canPrint />
      {decision ? (
        <VerificationDecision
          order={order}
          decision={decision}
          onClose={() => setDecision(null)}
          onConflict={() => {
            setDecision(null);
            setConflict(true);
          }}
          onDone={(done) => {
            setDecision(null);
            // Verified: stay to release the syringe. Returned or rejected: back to the queue.
            if (done !== 'verify') navigate(paths.verificationQueue.getHref());
          }}
        />
      ) : null}
      {releasing ? <ReleaseModal order={order} onClose={() => setReleasing(false)} /> : null}
    </Stack>
  );
}
