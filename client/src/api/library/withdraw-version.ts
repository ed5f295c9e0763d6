import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

/** Awaiting approval → draft, for changes after a colleague's query. */
export function withdrawVersion(versionId: number): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${versionId}/withdraw`, { method: 'POST', body: {}, schema: libraryVersionDetailSchema });
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
