import { useState } from 'react';
import { Text } from '@mantine/core';
import type { WardPolicyChange } from '@lockstep/shared';
import { SignatureModal } from '@/components/dialogs/signature-modal';
import { errorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useSignOffWardPolicyChange } from '@/api/ward-policy-changes/sign-off-ward-policy-change';
import { changeRows } from '../utils/policy-change';
import { SettingChangesTable } from './setting-changes-table';

export interface SignOffChangeModalProps {
  change: WardPolicyChange;
  onClose: () => void;
}

/** The second, clinical signature: the change applies to the ward as soon as it is signed. */
export function SignOffChangeModal({ change, onClose }: SignOffChangeModalProps) {
  const signOff = useSignOffWardPolicyChange();
  // One key for this sign-off: a retry of the same one is recorded once.
  const [idempotencyKey] = useState(() => crypto.randomUUID());
  const [refusal, setRefusal] = useState<string | null>(null);

  return (
    <SignatureModal
      title={`Sign off ${change.wardName}’s policy change`}
      size="xl"
      confirmLabel="Sign off"
      pending={signOff.isPending}
      refusal={refusal}
      refusalTitle="Not signed off"
      passwordDescription="Type your password again to sign the change off"
      backLabel="Cancel"
      onClose={onClose}
      onSign={(password, { passwordRefused, clearPassword }) => {
        setRefusal(null);
        signOff.mutate(
          { changeId: change.id, password, idempotencyKey },
          {
            onSuccess: (applied) => {
              notifySuccess('Change signed off', `${applied.wardName} works to the new values from the next observation.`);
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
        {change.wardName} works to these values from the next observation once you sign. Sign off only if each one is right for the ward.
      </Text>
      <SettingChangesTable rows={changeRows(change.settings)} label="Settings to sign off" withDefaults />
    </SignatureModal>
  );
}
