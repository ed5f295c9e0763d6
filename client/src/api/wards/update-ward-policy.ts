import { useMutation, useQueryClient } from '@tanstack/react-query';
import { wardPolicySettingsSchema, type UpdateWardPolicyRequest, type WardPolicySettings } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { auditKeys } from '@/api/audit/audit-keys';
import { wardKeys } from './ward-keys';

export interface UpdateWardPolicyVariables {
  wardId: number;
  changes: UpdateWardPolicyRequest;
}

/** Admin only. Any subset of the values; a 400 names each field out of range. */
export function updateWardPolicy({ wardId, changes }: UpdateWardPolicyVariables): Promise<WardPolicySettings> {
  return apiRequest(`/wards/${wardId}/policy`, { method: 'PATCH', body: changes, schema: wardPolicySettingsSchema });
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
