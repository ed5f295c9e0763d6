import { useState } from 'react';
import { List, Stack, Text } from '@mantine/core';
import { type CreateOrderRequest, formatRegimen, type OrderDetail, REGIMEN_FIELD_LABELS, type RegimenField } from '@lockstep/shared';
import { SignatureModal, type SignatureHandlers } from '@/components/dialogs/signature-modal';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { useCreateOrder } from '@/api/orders/create-order';
import { useReviseOrder } from '@/api/orders/revise-order';
import { reasonSubject } from './finding-reasons';

export interface SignOrderModalProps {
  /** The order as it will be sent, short of the password. */
  unsigned: Omit<CreateOrderRequest, 'signature'>;
  drugName: string;
  /** The returned order this signs a new version of. */
  revisingId?: number;
  /** The order form's `Idempotency-Key`: the same for every signing attempt of this form opening. */
  idempotencyKey: string;
  onSigned: (order: OrderDetail) => void;
  /** A 400: the form puts its field errors beside the inputs. */
  onRefusedFields: (error: unknown) => void;
  onClose: () => void;
}

/** The signing step: what is being signed, the reasons given, and the password typed again. */
export function SignOrderModal({
  unsigned,
  drugName,
  revisingId,
  idempotencyKey,
  onSigned,
  onRefusedFields,
  onClose,
}: SignOrderModalProps) {
  const create = useCreateOrder();
  const revise = useReviseOrder();
  const [refusal, setRefusal] = useState<string | null>(null);
  const pending = create.isPending || revise.isPending;

  const sign = (password: string, { passwordRefused }: SignatureHandlers) => {
    setRefusal(null);
    const request: CreateOrderRequest = { ...unsigned, signature: { password } };
    const handlers = {
      onSuccess: onSigned,
      onError: (error: unknown) => {
        if (passwordRefused(error)) return;
        if (isApiRequestError(error) && error.status === 400) onRefusedFields(error);
        else setRefusal(errorMessage(error));
      },
    };
    if (revisingId === undefined) create.mutate({ request, idempotencyKey }, handlers);
    else revise.mutate({ orderId: revisingId, request, idempotencyKey }, handlers);
  };

  const regimen = {
    drugName,
    concentrationPerMl: unsigned.concentrationPerMl,
    doseUnit: unsigned.doseUnit,
    loadingDose: unsigned.loadingDose ?? null,
    demandDose: unsigned.demandDose,
    lockoutMinutes: unsigned.lockoutMinutes,
    basalRatePerHour: unsigned.basalRatePerHour,
    oneHourLimit: unsigned.oneHourLimit ?? null,
    fourHourLimit: unsigned.fourHourLimit ?? null,
  };

  return (
    <SignatureModal
      title={revisingId === undefined ? 'Sign PCA order' : `Sign the revision of order ${revisingId}`}
      confirmLabel="Sign and send to pharmacy"
      pending={pending}
      refusal={refusal}
      onSign={sign}
      onClose={onClose}
    >
      <Stack gap="xs">
        <Text size="sm">You are signing this regimen; pharmacy verifies it before a syringe is released.</Text>
        <Text fw={600} className="tabular-nums" data-testid="signing-regimen">
          {formatRegimen(regimen)}
        </Text>
        {unsigned.overrides.length > 0 ? (
          <>
            <Text size="sm" fw={500}>
              Outside a soft limit, with your reasons:
            </Text>
            <List size="sm" spacing={4}>
              {unsigned.overrides.map((override) => (
                <List.Item key={override.field}>
                  {REGIMEN_FIELD_LABELS[override.field as RegimenField] ?? reasonSubject(override.field)}: {override.reason}
                </List.Item>
              ))}
            </List>
          </>
        ) : null}
      </Stack>
    </SignatureModal>
  );
}
