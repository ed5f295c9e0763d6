import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bolusResponseSchema, type BolusRequest, type BolusResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** A clinician bolus, witnessed by a second nurse (`signed`: a wrong witness password is shown beside the field). */
export function giveBolus(orderId: number, request: BolusRequest): Promise<BolusResponse> {
  return apiRequest(`/orders/${orderId}/boluses`, { method: 'POST', body: request, schema: bolusResponseSchema, signed: true });
}

export function useGiveBolus(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: BolusRequest) => giveBolus(orderId, request),
    // The order's usage and story, wherever they are shown.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}
