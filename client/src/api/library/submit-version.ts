import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail, type SubmitVersionRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export type SubmitVersionVariables = SubmitVersionRequest & { versionId: number };

/** Draft → awaiting approval. */
export function submitVersion({ versionId, note }: SubmitVersionVariables): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${versionId}/submit`, {
    method: 'POST',
    body: note ? { note } : {},
    schema: libraryVersionDetailSchema,
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
