import { orderDetailSchema, type OrderDetail, type ReasonRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export type CancelOrderVariables = ReasonRequest & { orderId: number };

/** The prescriber cancels an order that has not started, with the reason. */
export function cancelOrder({ orderId, ...request }: CancelOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/cancel`, { method: 'POST', body: request, schema: orderDetailSchema });
}

export function useCancelOrder() {
  return useStatusChange(cancelOrder);
}
