import type { QueryClient } from '@tanstack/react-query';
import { bedsideKeys } from './bedside-keys';

/** After any bedside action: this order and every order list, here and on the other order screens. */
export function invalidateAfterBedsideAction(queryClient: QueryClient): Promise<void> {
  return queryClient.invalidateQueries({ queryKey: bedsideKeys.orderCaches() });
}
