import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';
import { orderDetailSchema } from './order-schemas';

export interface VerifyOrderVariables {
  orderId: number;
  password: string;
}

/**
 * Pharmacy verifies, signed with the password typed again. 403 for the order's own prescriber;
 * 409 when it is no longer awaiting verification (someone else decided first).
 */
export function verifyOrder({ orderId, password }: VerifyOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/verify`, {
    method: 'POST',
    body: { signature: { password } },
    schema: orderDetailSchema,
    signed: true,
  });
}

export function useVerifyOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyOrder,
    // The order's status changes: its page, every queue and list that shows it.
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
    // A refusal (409 above all) means the order changed under us: fetch what it is now.
    onError: (_error, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
  });
}
