import { useMutation, useQueryClient } from '@tanstack/react-query';
import { syringeChangeResponseSchema, type SyringeChangeRequest, type SyringeChangeResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** Finishes the running syringe with witnessed waste; the new one starts only after a bedside check. */
export function changeSyringe(orderId: number, request: SyringeChangeRequest): Promise<SyringeChangeResponse> {
  return apiRequest(`/orders/${orderId}/syringe-changes`, {
    method: 'POST',
    body: request,
    schema: syringeChangeResponseSchema,
    signed: true,
  });
}

export function useChangeSyringe(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: SyringeChangeRequest) => changeSyringe(orderId, request),
    // The order's syringes and flags, on every order screen and list.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}
