import { queryOptions, useQuery } from '@tanstack/react-query';
import { orderDetailSchema, type OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export function getOrder(id: number, signal?: AbortSignal): Promise<OrderDetail> {
  return apiRequest(`/orders/${id}`, { schema: orderDetailSchema, signal });
}

export function orderQueryOptions(id: number) {
  return queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: ({ signal }) => getOrder(id, signal),
  });
}

export interface UseOrderOptions {
  /** 0 asks again on every opening: at the bedside and on the PCA page the status, syringe and flags must be current. */
  staleTime?: number;
  /** Polls the order, for flags raised by anyone's observation. */
  refetchInterval?: number;
}

/** One order with its history; `null` waits (e.g. for the previous version of an order that has none). */
export function useOrder(id: number | null, options: UseOrderOptions = {}) {
  return useQuery({ ...orderQueryOptions(id ?? 0), enabled: id !== null, ...options });
}
