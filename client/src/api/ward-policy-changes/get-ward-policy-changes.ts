import { queryOptions, useQuery } from '@tanstack/react-query';
import { wardPolicyChangesSchema, type WardPolicyChange } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { wardPolicyChangeKeys, type WardPolicyChangeFilter } from './ward-policy-change-keys';

/** Proposed ward policy changes (admin, charge nurse, pharmacist), newest first as the server sends them. */
export function getWardPolicyChanges(filter: WardPolicyChangeFilter, signal?: AbortSignal): Promise<WardPolicyChange[]> {
  return apiRequest('/wards/policy-changes', {
    schema: wardPolicyChangesSchema,
    params: { status: filter.status, wardId: filter.wardId },
    signal,
  });
}

export function wardPolicyChangesQueryOptions(filter: WardPolicyChangeFilter) {
  return queryOptions({
    queryKey: wardPolicyChangeKeys.list(filter),
    queryFn: ({ signal }) => getWardPolicyChanges(filter, signal),
  });
}

export interface UseWardPolicyChangesOptions {
  enabled?: boolean;
  /** Polled where a change made by someone else should show without a reload (the sign-off page). */
  refetchInterval?: number;
}

export function useWardPolicyChanges(filter: WardPolicyChangeFilter, options: UseWardPolicyChangesOptions = {}) {
  return useQuery({ ...wardPolicyChangesQueryOptions(filter), ...options });
}
