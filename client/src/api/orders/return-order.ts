import { orderDetailSchema, type OrderDetail, type ReasonRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export type ReturnOrderVariables = ReasonRequest & {
  orderId: number;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
};

/** Pharmacy returns the order to the prescriber with a query (a reason of 10 characters or more). */
export function returnOrder({ orderId, idempotencyKey, ...request }: ReturnOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/return`, {
    method: 'POST',
    body: request,
    schema: orderDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useReturnOrder() {
  return useStatusChange(returnOrder);
}
