import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { handoverBoardSchema, type HandoverBoard } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { handoverKeys } from './handover-keys';

// The stream announces every change on the ward, but nothing announces the clock: an
// observation becomes overdue with no event. A slow poll keeps "overdue" honest between events.
const CLOCK_REFRESH_MS = 60_000;

export function getHandoverBoard(wardId: number, signal?: AbortSignal): Promise<HandoverBoard> {
  return apiRequest(`/wards/${wardId}/handover`, { schema: handoverBoardSchema, signal });
}

export function handoverBoardQueryOptions(wardId: number) {
  return queryOptions({
    queryKey: handoverKeys.board(wardId),
    queryFn: ({ signal }) => getHandoverBoard(wardId, signal),
    refetchInterval: CLOCK_REFRESH_MS,
  });
}

/** One ward's board; `null` waits for a ward to be chosen. */
export function useHandoverBoard(wardId: number | null) {
  // Keep the current rows on screen while another ward's board loads.
  return useQuery({ ...handoverBoardQueryOptions(wardId ?? 0), enabled: wardId !== null, placeholderData: keepPreviousData });
}
