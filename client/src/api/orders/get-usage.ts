import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { usageSchema, type UsageResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** Attempts, doses and boluses over the last `hours`, by hour, with the syringe's projection and the next observation. */
export function getUsage(orderId: number, hours: number, signal?: AbortSignal): Promise<UsageResponse> {
  return apiRequest(`/orders/${orderId}/usage`, { schema: usageSchema, params: { hours }, signal });
}

export function usageQueryOptions(orderId: number, hours: number) {
  return queryOptions({
    queryKey: orderKeys.usage(orderId, hours),
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
