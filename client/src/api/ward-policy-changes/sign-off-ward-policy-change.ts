import { useMutation, useQueryClient } from '@tanstack/react-query';
import { wardPolicyChangeSchema, type SignOffWardPolicyChangeRequest, type WardPolicyChange } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { isApiRequestError } from '@/lib/api-error';
import { refreshAfterDecision, wardPolicyChangeKeys } from './ward-policy-change-keys';

export interface SignOffWardPolicyChangeVariables {
  changeId: number;
  password: string;
  /** One key per sign-off: sent again (a retry), it is recorded once. */
  idempotencyKey: string;
}

/**
 * A charge nurse or pharmacist, not the proposer, signs the change off and it applies at once. 401 for a
 * wrong password (on `signature.password`), 403 for the proposer, 409 when it is no longer pending.
 */
export function signOffWardPolicyChange({
  changeId,
  password,
  idempotencyKey,
}: SignOffWardPolicyChangeVariables): Promise<WardPolicyChange> {
  const body: SignOffWardPolicyChangeRequest = { signature: { password } };
  return apiRequest(`/wards/policy-changes/${changeId}/sign-off`, {
    method: 'POST',
    body,
    schema: wardPolicyChangeSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useSignOffWardPolicyChange() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOffWardPolicyChange,
    onSuccess: (change) => refreshAfterDecision(queryClient, change),
    // Decided by someone else meanwhile (409): the list shows it as it is now.
    onError: (error) =>
      isApiRequestError(error) && error.status === 409 ? queryClient.invalidateQueries({ queryKey: wardPolicyChangeKeys.all }) : undefined,
  });
}
