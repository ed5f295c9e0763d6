import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { usageSchema, type PcaUsage } from './pca-schemas';

/** The chart windows offered on the PCA page, in hours. */
export const USAGE_WINDOWS = [8, 12, 24] as const;
export type UsageWindow = (typeof USAGE_WINDOWS)[number];

export function getUsage(orderId: number, hours: number, signal?: AbortSignal): Promise<PcaUsage> {
  return apiRequest(`/orders/${orderId}/usage`, { schema: usageSchema, params: { hours }, signal });
}

export function usageQueryOptions(orderId: number, hours: number) {
  return queryOptions({
    queryKey: pcaKeys.usage(orderId, hours),
    queryFn: ({ signal }) => getUsage(orderId, hours, signal),
    // "Next observation due" and "overdue" move with the clock.
    staleTime: 0,
    refetchInterval: 60_000,
  });
}

export function useUsage(orderId: number, hours: number) {
  // Keep the previous window's figures on screen while another window loads.
  return useQuery({ ...usageQueryOptions(orderId, hours), placeholderData: keepPreviousData });
}
