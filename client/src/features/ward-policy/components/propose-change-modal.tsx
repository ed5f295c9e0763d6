import { SigningPasswordInput } from '@/components/dialogs/signing-password-input';
import { useState } from 'react';
import { Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconSignature } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import {
  MIN_REASON_LENGTH,
  proposeWardPolicyChangeSchema,
  type WardPolicyChange,
  type WardPolicySettingChanges,
  type WardPolicySettings,
} from '@lockstep/shared';
import { FormModal } from '@/components/dialogs/form-modal';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { useProposeWardPolicyChange } from '@/api/ward-policy-changes/propose-ward-policy-change';
import { proposalErrors, proposalRows } from '../utils/policy-change';
import { SettingChangesTable } from './setting-changes-table';

// The reason and the signature, checked with the server's words (the changes come from the form behind).
const reasonAndSignature = proposeWardPolicyChangeSchema.omit({ changes: true });

export interface ProposeChangeModalProps {
  wardId: number;
  wardName: string;
  settings: WardPolicySettingChanges;
  saved: WardPolicySettings;
  /** A setting the server refused: shown beside it on the form. */
  onSettingErrors: (errors: Record<string, string>) => void;
  onProposed: (change: WardPolicyChange) => void;
  onClose: () => void;
}

/** The admin reviews each setting from → to, gives the reason and signs; a charge nurse or pharmacist signs it off. */
export function ProposeChangeModal({ wardId, wardName, settings, saved, onSettingErrors, onProposed, onClose }: ProposeChangeModalProps) {
  const propose = useProposeWardPolicyChange();
  // One key for this proposal: a retry of the same one is recorded once.
  const [idempotencyKey] = useState(() => crypto.randomUUID());
  const [refusal, setRefusal] = useState<string | null>(null);
  const form = useForm({
    initialValues: { reason: '', signature: { password: '' } },
    validate: zod4Resolver(reasonAndSignature),
  });

  const submit = form.onSubmit(({ reason, signature }) => {
    setRefusal(null);
    propose.mutate(
      { wardId, changes: settings, reason: reason.trim(), password: signature.password, idempotencyKey },
      {
        onSuccess: onProposed,
        onError: (error) => {
          form.setFieldValue('signature.password', '');
          if (!isApiRequestError(error) || error.errors.length === 0) {
            setRefusal(errorMessage(error));
            return;
          }
          const sorted = proposalErrors(error.errors);
          if (sorted.reason) form.setFieldError('reason', sorted.reason);
          if (sorted.password) form.setFieldError('signature.password', sorted.password);
          const settingMessages = Object.values(sorted.settings);
          if (settingMessages.length > 0) onSettingErrors(sorted.settings);
          const shown = [
            ...(settingMessages.length > 0 ? ['Some settings were refused: see beside each on the form.'] : []),
            ...sorted.other,
          ];
          setRefusal(shown.length > 0 ? shown.join(' ') : null);
        },
      },
    );
  });

  return (
    <FormModal
      title={`Propose a change to ${wardName}’s policy`}
      size="xl"
      onClose={onClose}
      onSubmit={submit}
      refusal={refusal}
      refusalTitle="Not proposed"
      backLabel="Back to the form"
      confirm={{ label: 'Sign and propose', icon: <IconSignature size={16} aria-hidden />, pending: propose.isPending }}
      field={
        <Stack gap="sm">
          <Textarea
            label="Reason for the change"
            description={`Shown to the charge nurse or pharmacist who signs it off; at least ${MIN_REASON_LENGTH} characters`}
            autosize
            minRows={2}
            size="md"
            withAsterisk
            data-autofocus
            {...form.getInputProps('reason')}
          />
          <SigningPasswordInput description="Type your password again to sign the proposal" {...form.getInputProps('signature.password')} />
        </Stack>
      }
    >
      <Text size="sm">
        Clinical settings change only when a charge nurse or pharmacist signs the change off. Until then {wardName} works to its current
        values.
      </Text>
      <SettingChangesTable rows={proposalRows(settings, saved)} label="Settings to change" />
    </FormModal>
  );
}
