import { SigningPasswordInput } from '@/components/dialogs/signing-password-input';
import { useState } from 'react';
import { Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconX } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { declineWardPolicyChangeSchema, MIN_REASON_LENGTH, type WardPolicyChange } from '@lockstep/shared';
import { FormModal } from '@/components/dialogs/form-modal';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useDeclineWardPolicyChange } from '@/api/ward-policy-changes/decline-ward-policy-change';

export interface DeclineChangeModalProps {
  change: WardPolicyChange;
  onClose: () => void;
}

/** A charge nurse or pharmacist declines the change, saying why, signed: nothing changes on the ward. */
export function DeclineChangeModal({ change, onClose }: DeclineChangeModalProps) {
  const decline = useDeclineWardPolicyChange();
  // One key for this decline: a retry of the same one is recorded once.
  const [idempotencyKey] = useState(() => crypto.randomUUID());
  const [refusal, setRefusal] = useState<string | null>(null);
  const form = useForm({
    initialValues: { reason: '', signature: { password: '' } },
    validate: zod4Resolver(declineWardPolicyChangeSchema),
  });

  return (
    <FormModal
      title={`Decline ${change.wardName}’s policy change`}
      onClose={onClose}
      refusal={refusal}
      refusalTitle="Not declined"
      backLabel="Cancel"
      confirm={{ label: 'Sign and decline', color: 'red', icon: <IconX size={16} aria-hidden />, pending: decline.isPending }}
      onSubmit={form.onSubmit(({ reason, signature }) => {
        setRefusal(null);
        decline.mutate(
          { changeId: change.id, reason: reason.trim(), password: signature.password, idempotencyKey },
          {
            onSuccess: (declined) => {
              notifySuccess('Change declined', `${declined.wardName} keeps its current values.`);
              onClose();
            },
            onError: (error) => {
              form.setFieldValue('signature.password', '');
              const fields = isApiRequestError(error) ? error.errors : [];
              const reasonError = fields.find(({ field }) => field === 'reason');
              const passwordError = fields.find(({ field }) => field.startsWith('signature'));
              if (reasonError) form.setFieldError('reason', reasonError.message);
              if (passwordError) form.setFieldError('signature.password', passwordError.message);
              if (!reasonError && !passwordError) setRefusal(errorMessage(error));
            },
          },
        );
      })}
      field={
        <Stack gap="sm">
          <Textarea
            label="Reason for declining"
            description={`Shown to ${change.proposedBy.name} with the change; at least ${MIN_REASON_LENGTH} characters`}
            autosize
            minRows={2}
            size="md"
            withAsterisk
            data-autofocus
            {...form.getInputProps('reason')}
          />
          <SigningPasswordInput {...form.getInputProps('signature.password')} />
        </Stack>
      }
    >
      <Text size="sm">
        {change.wardName} keeps its current values. {change.proposedBy.name} may propose another change.
      </Text>
    </FormModal>
  );
}
