import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';
import { orderDetailSchema } from './order-schemas';

export interface RejectOrderVariables {
  orderId: number;
  reason: string;
}

/** Pharmacy rejects the order, with the reason. */
export function rejectOrder({ orderId, reason }: RejectOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/reject`, {
    method: 'POST',
    body: { reason },
    schema: orderDetailSchema,
  });
}

export function useRejectOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: rejectOrder,
    // The order's status changes: its page, every queue and list that shows it.
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
    // A refusal (409 above all) means the order changed under us: fetch what it is now.
    onError: (_error, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
  });
}
