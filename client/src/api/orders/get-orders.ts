import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { orderListEntrySchema, type OrderListEntry } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys, type OrderListFilters } from './order-keys';

/** The orders as the list answers them: each with its syringe state and next observation. */
export function getOrders(filters: OrderListFilters, signal?: AbortSignal): Promise<OrderListEntry[]> {
  return apiRequest('/orders', {
    schema: orderListEntrySchema.array(),
    params: {
      wardId: filters.wardId,
      // An empty list goes as a blank the server refuses: never read as every ward.
      wardIds: filters.wardIds ? filters.wardIds.join(',') : undefined,
      patientId: filters.patientId,
      status: filters.status && filters.status.length > 0 ? filters.status.join(',') : undefined,
      mine: filters.mine ? true : undefined,
    },
    signal,
  });
}

export function ordersQueryOptions(filters: OrderListFilters) {
  return queryOptions({
    queryKey: orderKeys.list(filters),
    queryFn: ({ signal }) => getOrders(filters, signal),
  });
}

export interface UseOrdersOptions {
  /** Polls the list, for a queue that others add to. */
  refetchInterval?: number;
  /** 0 asks again each time the list is shown. */
  staleTime?: number;
}

export function useOrders(filters: OrderListFilters, options: UseOrdersOptions = {}) {
  // Keep the current rows on screen while another ward's list loads.
  return useQuery({ ...ordersQueryOptions(filters), placeholderData: keepPreviousData, ...options });
}
