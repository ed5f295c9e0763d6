import { useMutation, useQueryClient } from '@tanstack/react-query';
import { orderDetailSchema, type CreateOrderRequest, type OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface ReviseOrderVariables {
  /** The returned order; the new version supersedes it. */
  orderId: number;
  request: CreateOrderRequest;
  /** One key per opening of the form, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** Signs a new version of a returned order (409 when it is no longer returned). */
export function reviseOrder({ orderId, request, idempotencyKey }: ReviseOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/revise`, {
    method: 'POST',
    body: request,
    schema: orderDetailSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useReviseOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reviseOrder,
    // The old version is now superseded and the new one is awaiting verification.
    onSuccess: (_order, { orderId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
      ]),
  });
}
