import { orderDetailSchema, type OrderDetail, type ReasonRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export type RejectOrderVariables = ReasonRequest & {
  orderId: number;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
};

/** Pharmacy rejects the order, with the reason. */
export function rejectOrder({ orderId, idempotencyKey, ...request }: RejectOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/reject`, {
    method: 'POST',
    body: request,
    schema: orderDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useRejectOrder() {
  return useStatusChange(rejectOrder);
}
