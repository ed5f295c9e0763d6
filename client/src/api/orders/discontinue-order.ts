import { useMutation, useQueryClient } from '@tanstack/react-query';
import { discontinueResponseSchema, type DiscontinueRequest, type DiscontinueResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** Ends the PCA on the prescriber's decision: the last syringe is reconciled with witnessed waste. */
export function discontinueOrder(orderId: number, request: DiscontinueRequest): Promise<DiscontinueResponse> {
  return apiRequest(`/orders/${orderId}/discontinue`, { method: 'POST', body: request, schema: discontinueResponseSchema, signed: true });
}

export function useDiscontinueOrder(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: DiscontinueRequest) => discontinueOrder(orderId, request),
    // The answer is the order as it is now; its status changes on every order screen and list.
    onSuccess: (answer) => {
      queryClient.setQueryData(orderKeys.detail(orderId), answer.order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}
