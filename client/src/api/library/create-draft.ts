import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type CreateDraftRequest, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

/** A new draft, copied from the ward's active version. 409 while the ward has an open version. */
export function createDraft(request: CreateDraftRequest): Promise<LibraryVersionDetail> {
  return apiRequest('/library/versions', { method: 'POST', body: request, schema: libraryVersionDetailSchema });
}

export function useCreateDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDraft,
    onSuccess: (draft) => {
      queryClient.setQueryData(libraryKeys.versionDetail(draft.id), draft);
      return queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(draft.wardId) });
    },
  });
}
