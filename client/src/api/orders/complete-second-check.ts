import { useMutation, useQueryClient } from '@tanstack/react-query';
import { secondCheckResponseSchema, type SecondCheckRequest, type SecondCheckResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface CompleteSecondCheckVariables {
  checkId: number;
  request: SecondCheckRequest;
  /** One key per opening of the second check, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/**
 * Step 2: the second nurse signs in on the same screen and enters the pump blind. `signed`: a
 * wrong colleague password is shown beside the field; the first nurse stays signed in.
 */
export function completeSecondCheck(
  orderId: number,
  { checkId, request, idempotencyKey }: CompleteSecondCheckVariables,
): Promise<SecondCheckResponse> {
  return apiRequest(`/orders/${orderId}/bedside-checks/${checkId}/second`, {
    method: 'POST',
    body: request,
    schema: secondCheckResponseSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useCompleteSecondCheck(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: CompleteSecondCheckVariables) => completeSecondCheck(orderId, variables),
    // A matched check starts the syringe (and the PCA): every order screen and list follows.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}
