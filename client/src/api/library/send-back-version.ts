import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail, type SendBackVersionRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export interface SendBackVersionVariables {
  versionId: number;
  comment: string;
  password: string;
  /** One key per send-back, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
}

/**
 * Awaiting approval → draft, with the reviewer's comment shown on the version. Signed: 401 for a
 * wrong password (on `signature.password`), 403 for a pharmacist who wrote the version (they
 * withdraw it instead), 409 when it is no longer awaiting approval.
 */
export function sendBackVersion({ versionId, comment, password, idempotencyKey }: SendBackVersionVariables): Promise<LibraryVersionDetail> {
  const body: SendBackVersionRequest = { signature: { password }, comment };
  return apiRequest(`/library/versions/${versionId}/send-back`, {
    method: 'POST',
    body,
    schema: libraryVersionDetailSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useSendBackVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendBackVersion,
    onSuccess: (version) => {
      queryClient.setQueryData(libraryKeys.versionDetail(version.id), version);
      return queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(version.wardId) });
    },
  });
}
