import { useMutation } from '@tanstack/react-query';
import { firstCheckResponseSchema, type FirstCheckRequest, type FirstCheckResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';

export interface StartFirstCheckVariables {
  request: FirstCheckRequest;
  /** One key per opening of the check, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** Step 1 of the bedside check: the signed-in nurse's patient, syringe and pump entry. */
export function startFirstCheck(orderId: number, { request, idempotencyKey }: StartFirstCheckVariables): Promise<FirstCheckResponse> {
  return apiRequest(`/orders/${orderId}/bedside-checks`, {
    method: 'POST',
    body: request,
    schema: firstCheckResponseSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useStartFirstCheck(orderId: number) {
  return useMutation({ mutationFn: (variables: StartFirstCheckVariables) => startFirstCheck(orderId, variables) });
}
