import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';
import { orderDetailSchema } from './order-schemas';

export function getOrder(id: number, signal?: AbortSignal): Promise<OrderDetail> {
  return apiRequest(`/orders/${id}`, { schema: orderDetailSchema, signal });
}

export function orderQueryOptions(id: number) {
  return queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: ({ signal }) => getOrder(id, signal),
  });
}

/** One order with its history; `null` waits (e.g. for the previous version of an order that has none). */
export function useOrder(id: number | null) {
  return useQuery({ ...orderQueryOptions(id ?? 0), enabled: id !== null });
}
