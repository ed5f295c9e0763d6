import { useMutation, useQueryClient } from '@tanstack/react-query';
import { syringeChangeResponseSchema, type SyringeChangeRequest, type SyringeChangeResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface ChangeSyringeVariables {
  request: SyringeChangeRequest;
  /** One key per opening of the syringe change, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** Finishes the running syringe with witnessed waste; the new one starts only after a bedside check. */
export function changeSyringe(orderId: number, { request, idempotencyKey }: ChangeSyringeVariables): Promise<SyringeChangeResponse> {
  return apiRequest(`/orders/${orderId}/syringe-changes`, {
    method: 'POST',
    body: request,
    schema: syringeChangeResponseSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useChangeSyringe(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: ChangeSyringeVariables) => changeSyringe(orderId, variables),
    // The order's syringes and flags, on every order screen and list.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}
