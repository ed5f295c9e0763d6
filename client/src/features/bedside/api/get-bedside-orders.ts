import { keepPreviousData, queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import type { OrderStatus, OrderSummary } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { bedsideKeys, type BedsideOrderFilters } from './bedside-keys';
import { bedsideOrderSummarySchema } from './bedside-schemas';
import { bedsideOrderQueryOptions } from './get-bedside-order';

/** What the bedside acts on: orders waiting for their first bedside check, and running ones. */
export const BEDSIDE_STATUSES: readonly OrderStatus[] = ['verified', 'active'];

export function getBedsideOrders(filters: BedsideOrderFilters, signal?: AbortSignal): Promise<OrderSummary[]> {
  return apiRequest('/orders', {
    schema: bedsideOrderSummarySchema.array(),
    params: { wardId: filters.wardId, patientId: filters.patientId, status: filters.status.join(',') },
    signal,
  });
}

export function bedsideOrdersQueryOptions(filters: BedsideOrderFilters) {
  return queryOptions({
    queryKey: bedsideKeys.list(filters),
    queryFn: ({ signal }) => getBedsideOrders(filters, signal),
  });
}

export function useBedsideOrders(filters: BedsideOrderFilters) {
  // Keep the current rows on screen while another ward's list loads.
  return useQuery({ ...bedsideOrdersQueryOptions(filters), placeholderData: keepPreviousData });
}

/**
 * The details (syringes) of each listed order, one request per order: the list answer does not
 * say whether a syringe is ready or running, and a ward holds only a handful of PCAs.
 */
export function useBedsideOrderDetails(orderIds: readonly number[]) {
  return useQueries({ queries: orderIds.map((id) => bedsideOrderQueryOptions(id)) });
}
