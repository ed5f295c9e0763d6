import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '@/lib/api-client';
import { bedsideOrderSchema, reconciliationSchema, type Colleague } from './bedside-schemas';
import { bedsideKeys } from './bedside-keys';
import { invalidateAfterBedsideAction } from './invalidate-order';

export type DiscontinueRequest = { reason: string; volumeInfusedMl: number; wastedMl: number; witness: Colleague };

export const discontinueResponseSchema = z.object({ order: bedsideOrderSchema, reconciliation: reconciliationSchema });
export type DiscontinueResponse = z.infer<typeof discontinueResponseSchema>;

/** Ends the PCA on the prescriber's decision: the last syringe is reconciled with witnessed waste. */
export function discontinueOrder(orderId: number, request: DiscontinueRequest): Promise<DiscontinueResponse> {
  return apiRequest(`/orders/${orderId}/discontinue`, { method: 'POST', body: request, schema: discontinueResponseSchema, signed: true });
}

export function useDiscontinueOrder(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: DiscontinueRequest) => discontinueOrder(orderId, request),
    onSuccess: (answer) => {
      queryClient.setQueryData(bedsideKeys.detail(orderId), answer.order);
      return invalidateAfterBedsideAction(queryClient);
    },
  });
}
