import { useMutation, useQueryClient } from '@tanstack/react-query';
import { secondCheckResponseSchema, type SecondCheckRequest, type SecondCheckResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/**
 * Step 2: the second nurse signs in on the same screen and enters the pump blind. `signed`: a
 * wrong colleague password is shown beside the field; the first nurse stays signed in.
 */
export function completeSecondCheck(orderId: number, checkId: number, request: SecondCheckRequest): Promise<SecondCheckResponse> {
  return apiRequest(`/orders/${orderId}/bedside-checks/${checkId}/second`, {
    method: 'POST',
    body: request,
    schema: secondCheckResponseSchema,
    signed: true,
  });
}

export function useCompleteSecondCheck(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ checkId, request }: { checkId: number; request: SecondCheckRequest }) => completeSecondCheck(orderId, checkId, request),
    // A matched check starts the syringe (and the PCA): every order screen and list follows.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}
