import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { wardPolicyKeys } from './ward-policy-keys';
import { wardPolicySettingsSchema, type WardPolicySettings } from './ward-policy-schemas';

export function getWardPolicy(wardId: number, signal?: AbortSignal): Promise<WardPolicySettings> {
  return apiRequest(`/wards/${wardId}/policy`, { schema: wardPolicySettingsSchema, signal });
}

export function wardPolicyQueryOptions(wardId: number) {
  return queryOptions({
    queryKey: wardPolicyKeys.detail(wardId),
    queryFn: ({ signal }) => getWardPolicy(wardId, signal),
  });
}

export function useWardPolicy(wardId: number | null) {
  return useQuery({ ...wardPolicyQueryOptions(wardId ?? 0), enabled: wardId !== null });
}
