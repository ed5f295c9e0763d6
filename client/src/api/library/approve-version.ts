import { useMutation, useQueryClient } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type ApproveVersionRequest, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { isApiRequestError } from '@/lib/api-error';
import { libraryKeys } from './library-keys';

export interface ApproveVersionVariables {
  versionId: number;
  /** The version's `submittedAt` as shown: the server refuses if it was submitted again since. */
  submittedAt: string;
  password: string;
  /** One key per opening of the dialog, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
}

/**
 * Awaiting approval → active; the ward's previous active version is retired. Signed: 401 for a
 * wrong password (on `signature.password`), 403 for the version's own author, 409 when the version
 * was withdrawn and submitted again after it was opened.
 */
export function approveVersion({
  versionId,
  submittedAt,
  password,
  idempotencyKey,
}: ApproveVersionVariables): Promise<LibraryVersionDetail> {
  const body: ApproveVersionRequest = { signature: { password }, submittedAt };
  return apiRequest(`/library/versions/${versionId}/approve`, {
    method: 'POST',
    body,
    schema: libraryVersionDetailSchema,
    signed: true,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useApproveVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: approveVersion,
    // The active version, the retired one and every open version's diff change together.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
    // Refused because the version changed (409): the page shows it as it is now, for a fresh
    // review, by the time the refusal is on screen (the mutation waits for this refetch).
    onError: (error) =>
      isApiRequestError(error) && error.status === 409 ? queryClient.invalidateQueries({ queryKey: libraryKeys.all }) : undefined,
  });
}
