import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '@/lib/api-client';
import { reconciliationSchema, type Colleague } from './bedside-schemas';
import { invalidateAfterBedsideAction } from './invalidate-order';

export type SyringeChangeRequest = { volumeInfusedMl: number; wastedMl: number; newReleaseCode: string; witness: Colleague };

export const syringeChangeResponseSchema = z.object({
  reconciliation: reconciliationSchema,
  newReleaseCode: z.string(),
  nextStep: z.string(),
});
export type SyringeChangeResponse = z.infer<typeof syringeChangeResponseSchema>;

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
    onSuccess: () => invalidateAfterBedsideAction(queryClient),
  });
}
