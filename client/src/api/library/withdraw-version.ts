import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export interface WithdrawVersionVariables {
  versionId: number;
  /** One key per withdrawal, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
}

/** Awaiting approval → draft, for changes after a colleague's query. */
export function withdrawVersion({ versionId, idempotencyKey }: WithdrawVersionVariables): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${versionId}/withdraw`, {
    method: 'POST',
    body: {},
    schema: libraryVersionDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useWithdrawVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawVersion,
    onSuccess: (version) => {
      queryClient.setQueryData(libraryKeys.versionDetail(version.id), version);
      return queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(version.wardId) });
    },
  });
}
