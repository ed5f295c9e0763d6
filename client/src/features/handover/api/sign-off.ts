import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signoffSchema, type CreateSignoffRequest, type HandoverSignoffResponse } from '@lockstep/shared';
import { orderKeys } from '@/api/orders/order-keys';
import { apiRequest } from '@/lib/api-client';
import { handoverKeys } from './handover-keys';

/**
 * The sign-off request and one key per opening of the sign-off dialog, sent as `Idempotency-Key`
 * (the same for a double-click or a retry).
 */
export type SignOffVariables = CreateSignoffRequest & { idempotencyKey: string };

export function signOff(wardId: number, { idempotencyKey, ...request }: SignOffVariables): Promise<HandoverSignoffResponse> {
  return apiRequest(`/wards/${wardId}/handover/signoffs`, {
    method: 'POST',
    body: request,
    schema: signoffSchema,
    // Signed with the nurse's password: a wrong one is shown beside the field, not a sign-out.
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useSignOff(wardId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: SignOffVariables) => signOff(wardId, variables),
    // The stream would refetch the board too; this makes the signer's own board follow at once.
    // The sign-off is filed under the order, so its story changes as well.
    onSuccess: (_signoff, { orderId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: handoverKeys.board(wardId) }),
        queryClient.invalidateQueries({ queryKey: orderKeys.audit(orderId) }),
      ]),
  });
}
