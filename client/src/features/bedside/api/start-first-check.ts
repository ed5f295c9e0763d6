import { useMutation } from '@tanstack/react-query';
import type { FirstCheckResponse, PumpSettings } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { firstCheckResponseSchema } from './bedside-schemas';

export type FirstCheckRequest = {
  patientMrn: string;
  /** yyyy-mm-dd, as on the wristband. */
  patientDateOfBirth: string;
  releaseCode: string;
  settings: PumpSettings;
};

/** Step 1 of the bedside check: the signed-in nurse's patient, syringe and pump entry. */
export function startFirstCheck(orderId: number, request: FirstCheckRequest): Promise<FirstCheckResponse> {
  return apiRequest(`/orders/${orderId}/bedside-checks`, { method: 'POST', body: request, schema: firstCheckResponseSchema });
}

export function useStartFirstCheck(orderId: number) {
  return useMutation({ mutationFn: (request: FirstCheckRequest) => startFirstCheck(orderId, request) });
}
