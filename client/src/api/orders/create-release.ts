import { useMutation, useQueryClient } from '@tanstack/react-query';
import { syringeReleaseSchema, type CreateReleaseRequest, type SyringeReleaseResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface CreateReleaseVariables {
  orderId: number;
  request: CreateReleaseRequest;
  /** One key per opening of the form, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/**
 * Pharmacy releases a labelled syringe for a verified or active order. 400 names the field (the
 * concentration must be the order's; outside 20–60 mL needs a reason; expiry in the future).
 */
export function createRelease({ orderId, request, idempotencyKey }: CreateReleaseVariables): Promise<SyringeReleaseResponse> {
  return apiRequest(`/orders/${orderId}/releases`, {
    method: 'POST',
    body: request,
    schema: syringeReleaseSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useCreateRelease() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRelease,
    // The order's syringes, wherever it is shown; its story rereads when the order does.
    onSuccess: (_release, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
  });
}
