import { useState } from 'react';
import { Alert, Button, Group, Modal, PasswordInput, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconSignature } from '@tabler/icons-react';
import type { LibraryVersion } from '@lockstep/shared';
import { errorMessage, isApiRequestError, isSignatureError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useApproveVersion } from '../api/approve-version';

export interface ApproveModalProps {
  version: LibraryVersion;
  onClose: () => void;
}

/** The second pharmacist's approval, signed with their password typed again. */
export function ApproveModal({ version, onClose }: ApproveModalProps) {
  const approve = useApproveVersion();
  // The submission on screen when the dialog opened is the one signed, even if a refetch behind
  // the dialog brings a newer one.
  const [reviewedSubmission] = useState(version.submittedAt);
  const [refusal, setRefusal] = useState<string | null>(null);
  // After a 409 the version on screen is not the one this dialog would sign: review it first.
  const mustReview = isApiRequestError(approve.error) && approve.error.status === 409;
  const form = useForm({
    initialValues: { password: '' },
    validate: { password: (value) => (value ? null : 'Enter your password to sign') },
  });

  const submit = form.onSubmit(({ password }) => {
    setRefusal(null);
    approve.mutate(
      { versionId: version.id, submittedAt: reviewedSubmission ?? '', password },
      {
        onSuccess: (approved) => {
          notifySuccess('Version approved', `Version ${approved.number} is now ${approved.wardName}'s active dose-limit library.`);
          onClose();
        },
        onError: (error) => {
          form.setFieldValue('password', '');
          if (isSignatureError(error) && isApiRequestError(error)) form.setFieldError('password', error.message);
          else setRefusal(errorMessage(error));
        },
      },
    );
  });

  return (
    <Modal opened onClose={onClose} title={`Approve version ${version.number}`} size="md">
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm">
            Version {version.number} becomes {version.wardName}&apos;s active dose-limit library as soon as you sign, and the version in use
            now is retired. Approve only after checking every change.
          </Text>
          {refusal ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not approved" role="alert">
              {refusal}
            </Alert>
          ) : null}
          {mustReview ? (
            <Group justify="flex-end">
              <Button onClick={onClose} data-autofocus>
                Close and review the changes
              </Button>
            </Group>
          ) : (
            <>
              <PasswordInput
                label="Your password"
                description="Type your password again to sign the approval"
                autoComplete="current-password"
                data-autofocus
                {...form.getInputProps('password')}
              />
              <Group justify="flex-end">
                <Button variant="default" onClick={onClose}>
                  Cancel
                </Button>
                <Button type="submit" leftSection={<IconSignature size={16} aria-hidden />} loading={approve.isPending}>
                  Sign and approve
                </Button>
              </Group>
            </>
          )}
        </Stack>
      </form>
    </Modal>
  );
}
