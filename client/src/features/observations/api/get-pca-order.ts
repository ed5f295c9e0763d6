import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { pcaOrderSchema, type PcaOrder } from './pca-schemas';

export function getPcaOrder(orderId: number, signal?: AbortSignal): Promise<PcaOrder> {
  return apiRequest(`/orders/${orderId}`, { schema: pcaOrderSchema, signal });
}

export function pcaOrderQueryOptions(orderId: number) {
  return queryOptions({
    queryKey: pcaKeys.detail(orderId),
    queryFn: ({ signal }) => getPcaOrder(orderId, signal),
    // Flags are raised by anyone's observation: ask again on opening and every minute.
    staleTime: 0,
    refetchInterval: 60_000,
  });
}

export function usePcaOrder(orderId: number) {
  return useQuery(pcaOrderQueryOptions(orderId));
}
