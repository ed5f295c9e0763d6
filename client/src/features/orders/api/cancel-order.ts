import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';
import { orderDetailSchema } from './order-schemas';

export interface CancelOrderVariables {
  orderId: number;
  reason: string;
}

/** The prescriber cancels an order that has not started, with the reason. */
export function cancelOrder({ orderId, reason }: CancelOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/cancel`, {
    method: 'POST',
    body: { reason },
    schema: orderDetailSchema,
  });
}

export function useCancelOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelOrder,
    // The order's status changes: its page, every queue and list that shows it.
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
    // A refusal (409 above all) means the order changed under us: fetch what it is now.
    onError: (_error, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
  });
}
