import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { pcaPauseStateSchema, type NaloxoneRequest, type PauseRequest, type PcaPauseState, type ResumeRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** Under the order's detail, so anything that refreshes the order refreshes its pause state. */
export const pauseKey = (orderId: number) => [...orderKeys.detail(orderId), 'pause'] as const;

export function getPauseState(orderId: number, signal?: AbortSignal): Promise<PcaPauseState> {
  return apiRequest(`/orders/${orderId}/pause`, { schema: pcaPauseStateSchema, signal });
}

export function pauseStateQueryOptions(orderId: number) {
  // Whether the pump is paused must be current at the bedside.
  return queryOptions({ queryKey: pauseKey(orderId), queryFn: ({ signal }) => getPauseState(orderId, signal), staleTime: 0 });
}

export function usePauseState(orderId: number) {
  return useQuery(pauseStateQueryOptions(orderId));
}

function usePauseMutation<T>(orderId: number, send: (request: T) => Promise<PcaPauseState>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    // The answer is the pause state as it is now; the order's flags and lists change with it.
    onSuccess: (answer) => {
      queryClient.setQueryData(pauseKey(orderId), answer);
      return queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}

/** Naloxone given, signed with the nurse's password: pauses the PCA and raises an urgent flag. */
export function useRecordNaloxone(orderId: number) {
  return usePauseMutation(orderId, (request: NaloxoneRequest) =>
    apiRequest(`/orders/${orderId}/naloxone`, { method: 'POST', body: request, schema: pcaPauseStateSchema, signed: true }),
  );
}

export function usePausePca(orderId: number) {
  return usePauseMutation(orderId, (request: PauseRequest) =>
    apiRequest(`/orders/${orderId}/pause`, { method: 'POST', body: request, schema: pcaPauseStateSchema }),
  );
}

/** Both nurses re-enter the pump settings; a mismatch answers 200 with the differences and stays paused. */
export function useResumePca(orderId: number) {
  return usePauseMutation(orderId, (request: ResumeRequest) =>
    apiRequest(`/orders/${orderId}/resume`, { method: 'POST', body: request, schema: pcaPauseStateSchema }),
  );
}
