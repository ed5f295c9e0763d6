import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { handoverKeys } from '../api/handover-keys';
import { followWardStream, type StreamStatus } from '../api/ward-stream';

/**
 * Keeps a ward's board live: each `ward-change` invalidates the board query (TanStack Query
 * refetches it; the page never reloads). The connection closes when the ward changes or the
 * board unmounts.
 */
export function useWardStream(wardId: number | null): StreamStatus {
  const queryClient = useQueryClient();
  const [status, setStatus] = useState<StreamStatus>('connecting');

  useEffect(() => {
    if (wardId === null) return undefined;
    const controller = new AbortController();
    const refetchBoard = () => void queryClient.invalidateQueries({ queryKey: handoverKeys.board(wardId) });
    void followWardStream({
      wardId,
      signal: controller.signal,
      onStatus: setStatus,
      onWardChange: refetchBoard,
      // Whatever changed while no stream was open (before the first, or during a drop) was not
      // announced: read the board again.
      onOpen: refetchBoard,
    });
    return () => controller.abort();
  }, [queryClient, wardId]);

  return status;
}
