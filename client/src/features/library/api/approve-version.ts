import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export interface ApproveVersionVariables {
  versionId: number;
  password: string;
}

/**
 * Awaiting approval → active; the ward's previous active version is retired. Signed: 401 for a
 * wrong password (on `signature.password`), 403 for the version's own author.
 */
export function approveVersion({ versionId, password }: ApproveVersionVariables): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${versionId}/approve`, {
    method: 'POST',
    body: { signature: { password } },
    schema: libraryVersionDetailSchema,
    signed: true,
  });
}

export function useApproveVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: approveVersion,
    // The active version, the retired one and every open version's diff change together.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
  });
}
