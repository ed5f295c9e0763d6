import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrderDetail } from '@lockstep/shared';
import { orderKeys } from './order-keys';

/**
 * A decision that answers the order at its new status (verify, return, reject, cancel): its page
 * shows the answer, and every queue and list that shows it refetches. A refusal (409 above all)
 * means the order changed under us: it is fetched as it is now.
 */
export function useStatusChange<Variables extends { orderId: number }>(decide: (variables: Variables) => Promise<OrderDetail>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decide,
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
    onError: (_error, { orderId }) => queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
  });
}
