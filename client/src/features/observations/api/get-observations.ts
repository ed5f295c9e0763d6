import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { observationSchema, type Observation } from './pca-schemas';

/** Oldest first. */
export function getObservations(orderId: number, signal?: AbortSignal): Promise<Observation[]> {
  return apiRequest(`/orders/${orderId}/observations`, { schema: observationSchema.array(), signal });
}

export function observationsQueryOptions(orderId: number) {
  return queryOptions({
    queryKey: pcaKeys.observations(orderId),
    queryFn: ({ signal }) => getObservations(orderId, signal),
    // The form checks pump totals against the last one: it must be current.
    staleTime: 0,
    refetchInterval: 60_000,
  });
}

export function useObservations(orderId: number) {
  return useQuery(observationsQueryOptions(orderId));
}
