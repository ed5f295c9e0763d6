import { orderDetailSchema, type OrderDetail, type ReasonRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export type CancelOrderVariables = ReasonRequest & {
  orderId: number;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
};

/** The prescriber cancels an order that has not started, with the reason. */
export function cancelOrder({ orderId, idempotencyKey, ...request }: CancelOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/cancel`, {
    method: 'POST',
    body: request,
    schema: orderDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useCancelOrder() {
  return useStatusChange(cancelOrder);
}
