import { orderDetailSchema, type OrderDetail, type ReasonRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export type ReturnOrderVariables = ReasonRequest & { orderId: number };

/** Pharmacy returns the order to the prescriber with a query (a reason of 10 characters or more). */
export function returnOrder({ orderId, ...request }: ReturnOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/return`, { method: 'POST', body: request, schema: orderDetailSchema });
}

export function useReturnOrder() {
  return useStatusChange(returnOrder);
}
