import { useMutation, useQueryClient } from '@tanstack/react-query';
import { orderDetailSchema, type CreateOrderRequest, type OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

export interface CreateOrderVariables {
  request: CreateOrderRequest;
  /** One key per opening of the form, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/**
 * Signs a new order. 401 on `signature.password` for a wrong password; 400 naming each field
 * with a blocking finding or a soft finding without a reason.
 */
export function createOrder({ request, idempotencyKey }: CreateOrderVariables): Promise<OrderDetail> {
  return apiRequest('/orders', {
    method: 'POST',
    body: request,
    schema: orderDetailSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useCreateOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createOrder,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
  });
}
