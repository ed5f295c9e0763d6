import { useState } from 'react';
import { Text } from '@mantine/core';
import type { OrderDetail } from '@lockstep/shared';
import { SignatureModal } from '@/components/dialogs/signature-modal';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useRejectOrder } from '@/api/orders/reject-order';
import { useReturnOrder } from '@/api/orders/return-order';
import { useVerifyOrder } from '@/api/orders/verify-order';
import { OrderInBrief } from './order-in-brief';
import { ReasonModal } from './reason-modal';

export type Decision = 'verify' | 'return' | 'reject';

export interface VerificationDecisionProps {
  order: OrderDetail;
  decision: Decision;
  onDone: (decision: Decision) => void;
  /** Someone else decided first (409): the screen says so with the status it has now. */
  onConflict: () => void;
  onClose: () => void;
}

function isConflict(error: unknown): boolean {
  return isApiRequestError(error) && error.status === 409;
}

/** The three pharmacy decisions: verify (signed), return with a query, reject. */
export function VerificationDecision({ order, decision, onDone, onConflict, onClose }: VerificationDecisionProps) {
  const verify = useVerifyOrder();
  const returnOrder = useReturnOrder();
  const reject = useRejectOrder();
  // One key per opening of the decision dialog: a double-click or a retry decides once.
  const idempotency = useIdempotencyKey();
  const [refusal, setRefusal] = useState<string | null>(null);
  const summary = <OrderInBrief order={order} />;
  const onError = (error: unknown) => {
    if (isConflict(error)) onConflict();
    else setRefusal(errorMessage(error));
  };

  if (decision === 'verify') {
    return (
      <SignatureModal
        title={`Verify order ${order.id}`}
        confirmLabel="Sign and verify"
        pending={verify.isPending}
        refusal={refusal}
        onClose={onClose}
        onSign={(password, { passwordRefused }) => {
          setRefusal(null);
          verify.mutate(
            { orderId: order.id, password, idempotencyKey: idempotency.key },
            {
              onSuccess: () => {
                idempotency.renew();
                notifySuccess('Order verified', `Order ${order.id} is verified: a syringe can be released.`);
                onDone('verify');
              },
              onError: (error) => {
                if (!passwordRefused(error)) onError(error);
              },
            },
          );
        }}
      >
        {summary}
        <Text size="sm">You have checked the order against the limit rule and the patient.</Text>
      </SignatureModal>
    );
  }

  const returning = decision === 'return';
  const mutation = returning ? returnOrder : reject;
  return (
    <ReasonModal
      title={returning ? `Return order ${order.id} with a query` : `Reject order ${order.id}`}
      label={returning ? 'Query for the prescriber' : 'Reason for rejecting'}
      description={
        returning
          ? 'The prescriber reads this, revises the order and signs it again. At least 10 characters.'
          : 'The prescriber reads this. At least 10 characters.'
      }
      confirmLabel={returning ? 'Return to prescriber' : 'Reject order'}
      confirmColor={returning ? undefined : 'red'}
      pending={mutation.isPending}
      refusal={refusal}
      onClose={onClose}
      onConfirm={(reason) => {
        setRefusal(null);
        mutation.mutate(
          { orderId: order.id, reason, idempotencyKey: idempotency.key },
          {
            onSuccess: () => {
              idempotency.renew();
              notifySuccess(returning ? 'Order returned' : 'Order rejected', `${order.prescriberName} has been told by e-mail.`);
              onDone(decision);
            },
            onError,
          },
        );
      }}
    >
      {summary}
    </ReasonModal>
  );
}
