import { SigningPasswordInput } from '@/components/dialogs/signing-password-input';
import { useState } from 'react';
import { Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconArrowBackUp } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { MIN_REASON_LENGTH, sendBackVersionSchema, type LibraryVersion } from '@lockstep/shared';
import { FormModal } from '@/components/dialogs/form-modal';
import { errorMessage, isApiRequestError, isSignatureError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useSendBackVersion } from '@/api/library/send-back-version';

export interface SendBackModalProps {
  version: LibraryVersion;
  onClose: () => void;
}

/** A reviewing pharmacist sends the version back to draft, saying what to change, signed with their password. */
export function SendBackModal({ version, onClose }: SendBackModalProps) {
  const sendBack = useSendBackVersion();
  const [refusal, setRefusal] = useState<string | null>(null);
  // One key for this send-back, so a retry of the same one carries the same key.
  const [idempotencyKey] = useState(() => crypto.randomUUID());
  const form = useForm({
    initialValues: { comment: '', signature: { password: '' } },
    validate: zod4Resolver(sendBackVersionSchema),
  });

  return (
    <FormModal
      title={`Send version ${version.number} back`}
      onClose={onClose}
      refusal={refusal}
      refusalTitle="Not sent back"
      confirm={{ label: 'Sign and send back', icon: <IconArrowBackUp size={16} aria-hidden />, pending: sendBack.isPending }}
      onSubmit={form.onSubmit(({ comment, signature }) => {
        setRefusal(null);
        sendBack.mutate(
          { versionId: version.id, comment: comment.trim(), password: signature.password, idempotencyKey },
          {
            onSuccess: (draft) => {
              notifySuccess('Sent back', `Version ${draft.number} is a draft again; your comment is shown on it.`);
              onClose();
            },
            onError: (error) => {
              form.setFieldValue('signature.password', '');
              if (isSignatureError(error) && isApiRequestError(error)) form.setFieldError('signature.password', error.message);
              else setRefusal(errorMessage(error));
            },
          },
        );
      })}
      field={
        <Stack gap="sm">
          <Textarea
            label="What needs changing"
            description={`Shown on the version to its authors; at least ${MIN_REASON_LENGTH} characters`}
            autosize
            minRows={3}
            size="md"
            withAsterisk
            data-autofocus
            {...form.getInputProps('comment')}
          />
          <SigningPasswordInput {...form.getInputProps('signature.password')} />
        </Stack>
      }
    >
      <Text size="sm">
        The version goes back to draft for its authors to change and submit again. Nothing changes in the active library.
      </Text>
    </FormModal>
  );
}
