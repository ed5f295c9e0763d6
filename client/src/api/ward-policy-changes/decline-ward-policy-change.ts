import { useMutation, useQueryClient } from '@tanstack/react-query';
import { wardPolicyChangeSchema, type DeclineWardPolicyChangeRequest, type WardPolicyChange } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { isApiRequestError } from '@/lib/api-error';
import { refreshAfterDecision, wardPolicyChangeKeys } from './ward-policy-change-keys';

export interface DeclineWardPolicyChangeVariables {
  changeId: number;
  reason: string;
  password: string;
  /** One key per decline: sent again (a retry), it is recorded once. */
  idempotencyKey: string;
}

/**
 * A charge nurse or pharmacist declines the change with a reason, signed; nothing changes. 401 for a wrong
 * password (on `signature.password`), 400 naming `reason`, 403 for the proposer, 409 when it is no longer pending.
 */
export function declineWardPolicyChange({
  changeId,
  reason,
  password,
  idempotencyKey,
}: DeclineWardPolicyChangeVariables): Promise<WardPolicyChange> {
  const body: DeclineWardPolicyChangeRequest = { reason, signature: { password } };
  return apiRequest(`/wards/policy-changes/${changeId}/decline`, {
    method: 'POST',
    body,
    schema: wardPolicyChangeSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useDeclineWardPolicyChange() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: declineWardPolicyChange,
    onSuccess: (change) => refreshAfterDecision(queryClient, change),
    onError: (error) =>
      isApiRequestError(error) && error.status === 409 ? queryClient.invalidateQueries({ queryKey: wardPolicyChangeKeys.all }) : undefined,
  });
}
