import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { bedsideKeys } from './bedside-keys';
import { bedsideOrderSchema, type BedsideOrder } from './bedside-schemas';

export function getBedsideOrder(orderId: number, signal?: AbortSignal): Promise<BedsideOrder> {
  return apiRequest(`/orders/${orderId}`, { schema: bedsideOrderSchema, signal });
}

export function bedsideOrderQueryOptions(orderId: number) {
  return queryOptions({
    queryKey: bedsideKeys.detail(orderId),
    queryFn: ({ signal }) => getBedsideOrder(orderId, signal),
    // At the bedside the status and syringe must be current: always ask again on opening.
    staleTime: 0,
  });
}

export function useBedsideOrder(orderId: number) {
  return useQuery(bedsideOrderQueryOptions(orderId));
}
