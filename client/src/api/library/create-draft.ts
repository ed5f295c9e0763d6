import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type CreateDraftRequest, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export interface CreateDraftVariables {
  request: CreateDraftRequest;
  /** One key per draft started from the screen, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** A new draft, copied from the ward's active version. 409 while the ward has an open version. */
export function createDraft({ request, idempotencyKey }: CreateDraftVariables): Promise<LibraryVersionDetail> {
  return apiRequest('/library/versions', {
    method: 'POST',
    body: request,
    schema: libraryVersionDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
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
