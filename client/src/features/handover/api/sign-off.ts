import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signoffSchema, type CreateSignoffRequest, type HandoverSignoffResponse } from '@lockstep/shared';
import { orderKeys } from '@/api/orders/order-keys';
import { apiRequest } from '@/lib/api-client';
import { handoverKeys } from './handover-keys';

/** 400 for an incoming sign-off without `pumpSettingsMatch: true`. */
export function signOff(wardId: number, request: CreateSignoffRequest): Promise<HandoverSignoffResponse> {
  return apiRequest(`/wards/${wardId}/handover/signoffs`, { method: 'POST', body: request, schema: signoffSchema });
}

export function useSignOff(wardId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: CreateSignoffRequest) => signOff(wardId, request),
    // The stream would refetch the board too; this makes the signer's own board follow at once.
    // The sign-off is filed under the order, so its story changes as well.
    onSuccess: (_signoff, { orderId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: handoverKeys.board(wardId) }),
        queryClient.invalidateQueries({ queryKey: orderKeys.audit(orderId) }),
      ]),
  });
}
