import { useState } from 'react';
import type { OrderSummary } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useCancelOrder } from '@/api/orders/cancel-order';
import { OrderInBrief } from './order-in-brief';
import { ReasonModal } from './reason-modal';

/** The prescriber cancels an order that has not started, saying why. */
export function CancelOrderModal({ order, onClose }: { order: OrderSummary; onClose: () => void }) {
  const cancel = useCancelOrder();
  // One key per opening of the dialog: a double-click or a retry cancels once.
  const idempotency = useIdempotencyKey();
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <ReasonModal
      title={`Cancel order ${order.id}`}
      label="Reason for cancelling"
      confirmLabel="Cancel the order"
      confirmColor="red"
      pending={cancel.isPending}
      refusal={refusal}
      onClose={onClose}
      onConfirm={(reason) =>
        cancel.mutate(
          { orderId: order.id, reason, idempotencyKey: idempotency.key },
          {
            onSuccess: () => {
              idempotency.renew();
              notifySuccess('Order cancelled', `Order ${order.id} for ${order.patientName} is cancelled.`);
              onClose();
            },
            onError: (error) => setRefusal(errorMessage(error)),
          },
        )
      }
    >
      <OrderInBrief order={order} withMrn={false} />
    </ReasonModal>
  );
}
