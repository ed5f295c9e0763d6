import { useMutation, useQueryClient } from '@tanstack/react-query';
import { wardPolicySettingsSchema, type UpdateWardPolicyRequest, type WardPolicySettings } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { auditKeys } from '@/api/audit/audit-keys';
import { wardKeys } from './ward-keys';

export interface UpdateWardPolicyVariables {
  wardId: number;
  changes: UpdateWardPolicyRequest;
  /** One key per opening of the form, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
}

/** Admin only. Any subset of the values; a 400 names each field out of range. */
export function updateWardPolicy({ wardId, changes, idempotencyKey }: UpdateWardPolicyVariables): Promise<WardPolicySettings> {
  return apiRequest(`/wards/${wardId}/policy`, {
    method: 'PATCH',
    body: changes,
    schema: wardPolicySettingsSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useUpdateWardPolicy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateWardPolicy,
    onSuccess: (policy, { wardId }) => {
      queryClient.setQueryData(wardKeys.policy(wardId), policy);
      // The change is now in the audit trail ("Recent changes" below the form).
      void queryClient.invalidateQueries({ queryKey: auditKeys.all });
    },
  });
}
