import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { wardThresholdsSchema, type WardThresholds } from './pca-schemas';

/** The ward's breathing thresholds (from its policy), to warn before an urgent flag is raised. */
export function getWardThresholds(wardId: number, signal?: AbortSignal): Promise<WardThresholds> {
  return apiRequest(`/wards/${wardId}/policy`, { schema: wardThresholdsSchema, signal });
}

export function wardThresholdsQueryOptions(wardId: number) {
  return queryOptions({
    queryKey: pcaKeys.wardPolicy(wardId),
    queryFn: ({ signal }) => getWardThresholds(wardId, signal),
  });
}

export function useWardThresholds(wardId: number | undefined) {
  return useQuery({ ...wardThresholdsQueryOptions(wardId ?? 0), enabled: wardId !== undefined });
}
