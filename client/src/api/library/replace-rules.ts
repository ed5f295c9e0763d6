import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail, type ReplaceRulesRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export type ReplaceRulesVariables = ReplaceRulesRequest & {
  versionId: number;
  /** One key per opening of the rules editor, sent as `Idempotency-Key` (the same for a retry). */
  idempotencyKey: string;
};

/** Draft only. A 400 names each field as `rules.<index>.…`. */
export function replaceRules({ versionId, rules, idempotencyKey }: ReplaceRulesVariables): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${versionId}/rules`, {
    method: 'PUT',
    body: { rules },
    schema: libraryVersionDetailSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useReplaceRules() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: replaceRules,
    onSuccess: (version) => {
      queryClient.setQueryData(libraryKeys.versionDetail(version.id), version);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: libraryKeys.diff(version.id) }),
        queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(version.wardId) }),
      ]);
    },
  });
}
