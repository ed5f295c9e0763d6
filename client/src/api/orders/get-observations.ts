import { queryOptions, useQuery } from '@tanstack/react-query';
import { observationSchema, type ObservationResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** Oldest first. */
export function getObservations(orderId: number, signal?: AbortSignal): Promise<ObservationResponse[]> {
  return apiRequest(`/orders/${orderId}/observations`, { schema: observationSchema.array(), signal });
}

export function observationsQueryOptions(orderId: number) {
  return queryOptions({
    queryKey: orderKeys.observations(orderId),
    queryFn: ({ signal }) => getObservations(orderId, signal),
    // The form checks pump totals against the last one: it must be current.
    staleTime: 0,
    refetchInterval: 60_000,
  });
}

export function useObservations(orderId: number) {
  return useQuery(observationsQueryOptions(orderId));
}
