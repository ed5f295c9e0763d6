import { useState } from 'react';
import { Button, Group, Text } from '@mantine/core';
import type { LibraryVersionDetail } from '@lockstep/shared';
import { SignatureModal } from '@/components/dialogs/signature-modal';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useApproveVersion } from '@/api/library/approve-version';
import { useAffectedOrders } from '@/api/library/get-affected-orders';
import { useLibraryDiff } from '@/api/library/get-library-diff';
import { changeRows } from '../utils/diff-rows';
import { ApproveReview } from './approve-review';

export interface ApproveModalProps {
  version: LibraryVersionDetail;
  onClose: () => void;
}

/**
 * The second pharmacist's approval, signed with their password typed again, after the large
 * changes (listed first) and the running orders the new limits would put outside.
 */
export function ApproveModal({ version, onClose }: ApproveModalProps) {
  const approve = useApproveVersion();
  // One key per opening of the dialog: a double-click or a retry signs one approval.
  const idempotency = useIdempotencyKey();
  const diff = useLibraryDiff(version.id);
  const affected = useAffectedOrders(version.id);
  // The submission on screen when the dialog opened is the one signed, even if a refetch behind
  // the dialog brings a newer one.
  const [reviewedSubmission] = useState(version.submittedAt);
  const [refusal, setRefusal] = useState<string | null>(null);
  // After a 409 the version on screen is not the one this dialog would sign: review it first.
  const mustReview = isApiRequestError(approve.error) && approve.error.status === 409;

  return (
    <SignatureModal
      title={`Approve version ${version.number}`}
      size="xl"
      confirmLabel="Sign and approve"
      pending={approve.isPending}
      refusal={refusal}
      refusalTitle="Not approved"
      passwordDescription="Type your password again to sign the approval"
      backLabel="Cancel"
      instead={
        mustReview ? (
          <Group justify="flex-end">
            <Button onClick={onClose} data-autofocus>
              Close and review the changes
            </Button>
          </Group>
        ) : undefined
      }
      onClose={onClose}
      onSign={(password, { passwordRefused, clearPassword }) => {
        setRefusal(null);
        approve.mutate(
          { versionId: version.id, submittedAt: reviewedSubmission ?? '', password, idempotencyKey: idempotency.key },
          {
            onSuccess: (approved) => {
              idempotency.renew();
              notifySuccess('Version approved', `Version ${approved.number} is now ${approved.wardName}'s active dose-limit library.`);
              onClose();
            },
            onError: (error) => {
              clearPassword();
              if (!passwordRefused(error)) setRefusal(errorMessage(error));
            },
          },
        );
      }}
    >
      <Text size="sm">
        Version {version.number} becomes {version.wardName}&apos;s active dose-limit library as soon as you sign, and the version in use now
        is retired. Approve only after checking every change.
      </Text>
      <ApproveReview
        rows={diff.data ? changeRows(diff.data, version.rules) : null}
        addedRules={diff.data?.added.length ?? 0}
        removedRules={diff.data?.removed.length ?? 0}
        affected={affected.isError ? undefined : (affected.data ?? null)}
      />
    </SignatureModal>
  );
}
