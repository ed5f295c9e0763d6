import { useMutation, useQueryClient } from '@tanstack/react-query';
import { recordedObservationSchema, type CreateObservationRequest, type RecordedObservation } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface RecordObservationVariables {
  orderId: number;
  observation: CreateObservationRequest;
  /** One key per opening of the form, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** 400 names the fields (pump totals never go down within one syringe); 409 when the PCA is not running. */
export function recordObservation({ orderId, observation, idempotencyKey }: RecordObservationVariables): Promise<RecordedObservation> {
  return apiRequest(`/orders/${orderId}/observations`, {
    method: 'POST',
    body: observation,
    schema: recordedObservationSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useRecordObservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordObservation,
    // The order's flags and "next due", its observations, charts and story all change.
    onSuccess: (_observation, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
  });
}
