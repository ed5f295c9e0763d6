import { useMutation } from '@tanstack/react-query';
import { firstCheckResponseSchema, type FirstCheckRequest, type FirstCheckResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';

/** Step 1 of the bedside check: the signed-in nurse's patient, syringe and pump entry. */
export function startFirstCheck(orderId: number, request: FirstCheckRequest): Promise<FirstCheckResponse> {
  return apiRequest(`/orders/${orderId}/bedside-checks`, { method: 'POST', body: request, schema: firstCheckResponseSchema });
}

export function useStartFirstCheck(orderId: number) {
  return useMutation({ mutationFn: (request: FirstCheckRequest) => startFirstCheck(orderId, request) });
}
