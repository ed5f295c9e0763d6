import { useMutation, useQueryClient } from '@tanstack/react-query';
import { discontinueResponseSchema, type DiscontinueRequest, type DiscontinueResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface DiscontinueOrderVariables {
  request: DiscontinueRequest;
  /** One key per opening of the discontinue form, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** Ends the PCA on the prescriber's decision: the last syringe is reconciled with witnessed waste. */
export function discontinueOrder(orderId: number, { request, idempotencyKey }: DiscontinueOrderVariables): Promise<DiscontinueResponse> {
  return apiRequest(`/orders/${orderId}/discontinue`, {
    method: 'POST',
    body: request,
    schema: discontinueResponseSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useDiscontinueOrder(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: DiscontinueOrderVariables) => discontinueOrder(orderId, variables),
    // The answer is the order as it is now; its status changes on every order screen and list.
    onSuccess: (answer) => {
      queryClient.setQueryData(orderKeys.detail(orderId), answer.order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}
