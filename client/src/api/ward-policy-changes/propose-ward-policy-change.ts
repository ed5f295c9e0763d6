import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  wardPolicyChangeSchema,
  type ProposeWardPolicyChangeRequest,
  type WardPolicyChange,
  type WardPolicySettingChanges,
} from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { isApiRequestError } from '@/lib/api-error';
import { auditKeys } from '@/api/audit/audit-keys';
import { wardPolicyChangeKeys } from './ward-policy-change-keys';

export interface ProposeWardPolicyChangeVariables {
  wardId: number;
  changes: WardPolicySettingChanges;
  reason: string;
  password: string;
  /** One key per proposal the admin signs: sent again (a retry), it is recorded once. */
  idempotencyKey: string;
}

/**
 * Admin only, signed: the clinical settings change only when a charge nurse or pharmacist signs it off.
 * 401 for a wrong password (on `signature.password`), 400 naming `changes.<setting>` or `reason`, 409 when a
 * change is already waiting on this ward.
 */
export function proposeWardPolicyChange({
  wardId,
  changes,
  reason,
  password,
  idempotencyKey,
}: ProposeWardPolicyChangeVariables): Promise<WardPolicyChange> {
  const body: ProposeWardPolicyChangeRequest = { changes, reason, signature: { password } };
  return apiRequest(`/wards/${wardId}/policy-changes`, {
    method: 'POST',
    body,
    schema: wardPolicyChangeSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useProposeWardPolicyChange() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: proposeWardPolicyChange,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: wardPolicyChangeKeys.all });
      void queryClient.invalidateQueries({ queryKey: auditKeys.all });
    },
    // Refused because a change is already waiting (409): show it above the form.
    onError: (error) =>
      isApiRequestError(error) && error.status === 409 ? queryClient.invalidateQueries({ queryKey: wardPolicyChangeKeys.all }) : undefined,
  });
}
