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

/** A pause write: the request and one key per opening of its form, sent as `Idempotency-Key` (the same for a retry). */
export interface PauseWriteVariables<T> {
  request: T;
  idempotencyKey: string;
}

function usePauseMutation<T>(orderId: number, path: string, signed = false) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ request, idempotencyKey }: PauseWriteVariables<T>) =>
      apiRequest(`/orders/${orderId}/${path}`, {
        method: 'POST',
        body: request,
        schema: pcaPauseStateSchema,
        signed,
        headers: { 'Idempotency-Key': idempotencyKey },
      }),
    // The answer is the pause state as it is now; the order's flags and lists change with it.
    onSuccess: (answer) => {
      queryClient.setQueryData(pauseKey(orderId), answer);
      return queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}

/** Naloxone given, signed with the nurse's password: pauses the PCA and raises an urgent flag. */
export function useRecordNaloxone(orderId: number) {
  return usePauseMutation<NaloxoneRequest>(orderId, 'naloxone', true);
}

export function usePausePca(orderId: number) {
  return usePauseMutation<PauseRequest>(orderId, 'pause');
}

/** Both nurses re-enter the pump settings; a mismatch answers 200 with the differences and stays paused. */
export function useResumePca(orderId: number) {
  return usePauseMutation<ResumeRequest>(orderId, 'resume');
}
