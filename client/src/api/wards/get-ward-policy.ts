import { queryOptions, useQuery } from '@tanstack/react-query';
import { wardPolicySettingsSchema, type WardPolicySettings } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { wardKeys } from './ward-keys';

/** The ward's monitoring and escalation settings and the addresses its e-mail goes to. */
export function getWardPolicy(wardId: number, signal?: AbortSignal): Promise<WardPolicySettings> {
  return apiRequest(`/wards/${wardId}/policy`, { schema: wardPolicySettingsSchema, signal });
}

export function wardPolicyQueryOptions(wardId: number) {
  return queryOptions({
    queryKey: wardKeys.policy(wardId),
    queryFn: ({ signal }) => getWardPolicy(wardId, signal),
  });
}

/** `null` waits for a ward to be chosen (or for the order that names it). */
export function useWardPolicy(wardId: number | null) {
  return useQuery({ ...wardPolicyQueryOptions(wardId ?? 0), enabled: wardId !== null });
}
