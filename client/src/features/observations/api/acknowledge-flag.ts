import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FlagResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { flagSchema } from './pca-schemas';

export interface AcknowledgeFlagVariables {
  orderId: number;
  flagId: number;
  note: string;
}

/** 409 when someone else acknowledged it first. */
export function acknowledgeFlag({ flagId, note }: AcknowledgeFlagVariables): Promise<FlagResponse> {
  return apiRequest(`/flags/${flagId}/acknowledge`, { method: 'POST', body: { note }, schema: flagSchema });
}

export function useAcknowledgeFlag() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acknowledgeFlag,
    // On a 409 too: the list must show who acknowledged it.
    onSettled: (_flag, _error, { orderId }) => queryClient.invalidateQueries({ queryKey: pcaKeys.detail(orderId) }),
  });
}
