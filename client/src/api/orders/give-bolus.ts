import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bolusResponseSchema, type BolusRequest, type BolusResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface GiveBolusVariables {
  request: BolusRequest;
  /** One key per opening of the bolus form, sent as `Idempotency-Key`: a double-click or a retry gives one bolus. */
  idempotencyKey: string;
}

/** A clinician bolus, witnessed by a second nurse (`signed`: a wrong witness password is shown beside the field). */
export function giveBolus(orderId: number, { request, idempotencyKey }: GiveBolusVariables): Promise<BolusResponse> {
  return apiRequest(`/orders/${orderId}/boluses`, {
    method: 'POST',
    body: request,
    schema: bolusResponseSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useGiveBolus(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: GiveBolusVariables) => giveBolus(orderId, variables),
    // The order's usage and story, wherever they are shown.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}
