import { orderDetailSchema, type OrderDetail, type ReasonRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export type RejectOrderVariables = ReasonRequest & { orderId: number };

/** Pharmacy rejects the order, with the reason. */
export function rejectOrder({ orderId, ...request }: RejectOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/reject`, { method: 'POST', body: request, schema: orderDetailSchema });
}

export function useRejectOrder() {
  return useStatusChange(rejectOrder);
}
