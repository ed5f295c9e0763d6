import { useMutation, useQueryClient } from '@tanstack/react-query';
import { flagSchema, type AcknowledgeFlagRequest, type FlagResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export type AcknowledgeFlagVariables = AcknowledgeFlagRequest & {
  orderId: number;
  flagId: number;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
};

/** 409 when someone else acknowledged it first. */
export function acknowledgeFlag({ flagId, note, idempotencyKey }: AcknowledgeFlagVariables): Promise<FlagResponse> {
  const body: AcknowledgeFlagRequest = { note };
  return apiRequest(`/flags/${flagId}/acknowledge`, {
    method: 'POST',
    body,
    schema: flagSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useAcknowledgeFlag() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acknowledgeFlag,
    // The flags are the order's own (its observations and usage stay as they were). On a 409 too:
    // the list must show who acknowledged it.
    onSettled: (_flag, _error, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
  });
}
