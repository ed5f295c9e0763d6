import type { QueryClient } from '@tanstack/react-query';
import type { WardPolicyChange, WardPolicyChangeStatus } from '@lockstep/shared';
import { auditKeys } from '@/api/audit/audit-keys';
import { wardKeys } from '@/api/wards/ward-keys';

export interface WardPolicyChangeFilter {
  status?: WardPolicyChangeStatus;
  /** One ward's changes; left out, every ward the reader may see. */
  wardId?: number;
}

// The admin's ward policy screen and the approvers' sign-off page read the same lists: a sign-off or
// a proposal refreshes both.
export const wardPolicyChangeKeys = {
  all: ['ward-policy-changes'] as const,
  lists: () => [...wardPolicyChangeKeys.all, 'list'] as const,
  list: (filter: WardPolicyChangeFilter) => [...wardPolicyChangeKeys.lists(), filter] as const,
};

/**
 * After a sign-off or a decline: the lists, and (a sign-off applies the change) the ward's policy, which the
 * policy screen and the observation form read, and the audit trail behind "Recent changes".
 */
export function refreshAfterDecision(queryClient: QueryClient, change: Pick<WardPolicyChange, 'wardId'>): void {
  void queryClient.invalidateQueries({ queryKey: wardPolicyChangeKeys.all });
  void queryClient.invalidateQueries({ queryKey: wardKeys.policy(change.wardId) });
  void queryClient.invalidateQueries({ queryKey: auditKeys.all });
}
