import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HandoverSignoffResponse, SignoffRole } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { handoverKeys } from './handover-keys';
import { signoffSchema } from './handover-schemas';

export interface SignOffRequest {
  orderId: number;
  role: SignoffRole;
  /** The incoming nurse's confirmation; the server refuses an incoming sign-off without it. */
  pumpSettingsMatch?: true;
}

export function signOff(wardId: number, request: SignOffRequest): Promise<HandoverSignoffResponse> {
  return apiRequest(`/wards/${wardId}/handover/signoffs`, { method: 'POST', body: request, schema: signoffSchema });
}

export function useSignOff(wardId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: SignOffRequest) => signOff(wardId, request),
    // The stream would refetch too; this makes the signer's own board follow at once.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: handoverKeys.board(wardId) }),
  });
}
