import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail, type SubmitVersionRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export type SubmitVersionVariables = SubmitVersionRequest & {
  versionId: number;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
};

/** Draft → awaiting approval. */
export function submitVersion({ versionId, note, idempotencyKey }: SubmitVersionVariables): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${versionId}/submit`, {
    method: 'POST',
    body: note ? { note } : {},
    schema: libraryVersionDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useSubmitVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: submitVersion,
    onSuccess: (version) => {
      queryClient.setQueryData(libraryKeys.versionDetail(version.id), version);
      return queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(version.wardId) });
    },
  });
}
