import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LibraryVersion } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export interface DiscardVersionVariables {
  version: Pick<LibraryVersion, 'id' | 'wardId'>;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
}

/** Removes a draft (204). Versions that were ever active are kept for the record. */
export async function discardVersion({ version, idempotencyKey }: DiscardVersionVariables): Promise<void> {
  await apiRequest<null>(`/library/versions/${version.id}`, { method: 'DELETE', headers: { 'Idempotency-Key': idempotencyKey } });
}

export function useDiscardVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: discardVersion,
    onSuccess: (_answer, { version }) => {
      queryClient.removeQueries({ queryKey: libraryKeys.versionDetail(version.id) });
      queryClient.removeQueries({ queryKey: libraryKeys.diff(version.id) });
      return queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(version.wardId) });
    },
  });
}
