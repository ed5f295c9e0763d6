import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrderDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';
import { orderDetailSchema } from './order-schemas';

export interface ReturnOrderVariables {
  orderId: number;
  reason: string;
}

/** Pharmacy returns the order to the prescriber with a query (a reason of 10 characters or more). */
export function returnOrder({ orderId, reason }: ReturnOrderVariables): Promise<OrderDetail> {
  return apiRequest(`/orders/${orderId}/return`, {
    method: 'POST',
    body: { reason },
    schema: orderDetailSchema,
  });
}

export function useReturnOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: returnOrder,
    // The order's status changes: its page, every queue and list that shows it.
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
    // A refusal (409 above all) means the order changed under us: fetch what it is now.
    onError: (_error, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
  });
}
