import { orderDetailSchema, type OrderDetail, type SignedRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { useStatusChange } from './use-status-change';

export interface VerifyOrderVariables {
  orderId: number;
  password: string;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
}

/**
 * Pharmacy verifies, signed with the password typed again. 403 for the order's own prescriber;
 * 409 when it is no longer awaiting verification (someone else decided first).
 */
export function verifyOrder({ orderId, password, idempotencyKey }: VerifyOrderVariables): Promise<OrderDetail> {
  const body: SignedRequest = { signature: { password } };
  return apiRequest(`/orders/${orderId}/verify`, {
    method: 'POST',
    body,
    schema: orderDetailSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useVerifyOrder() {
  return useStatusChange(verifyOrder);
}
