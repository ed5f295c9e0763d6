import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { doseUnitSchema } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import type { Colleague } from './bedside-schemas';
import { invalidateAfterBedsideAction } from './invalidate-order';

export type BolusRequest = { amount: number; reason: string; overrideReason?: string; witness: Colleague };

// The server types this answer locally; the bedside checks what it shows.
export const bolusResponseSchema = z.object({
  id: z.number().int(),
  amount: z.number(),
  doseUnit: doseUnitSchema,
  reason: z.string(),
  overrideReason: z.string().nullable().optional(),
  givenByName: z.string(),
  witnessName: z.string(),
  at: z.string(),
});
export type BolusResponse = z.infer<typeof bolusResponseSchema>;

export function giveBolus(orderId: number, request: BolusRequest): Promise<BolusResponse> {
  return apiRequest(`/orders/${orderId}/boluses`, { method: 'POST', body: request, schema: bolusResponseSchema, signed: true });
}

export function useGiveBolus(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: BolusRequest) => giveBolus(orderId, request),
    onSuccess: () => invalidateAfterBedsideAction(queryClient),
  });
}
