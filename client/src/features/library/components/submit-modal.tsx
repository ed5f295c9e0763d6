import { useState } from 'react';
import { Alert, Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { IconAlertCircle, IconSend } from '@tabler/icons-react';
import type { LibraryVersion } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useSubmitVersion } from '@/api/library/submit-version';

const NOTE_MAX = 1000;

export function SubmitModal({ version, onClose }: { version: LibraryVersion; onClose: () => void }) {
  const submitVersion = useSubmitVersion();
  // One key per opening of the dialog: a double-click or a retry is one submission.
  const idempotency = useIdempotencyKey();
  const [note, setNote] = useState(version.note);

  const submit = () => {
    const trimmed = note.trim();
    submitVersion.mutate(
      { versionId: version.id, note: trimmed && trimmed !== version.note ? trimmed : undefined, idempotencyKey: idempotency.key },
      {
        onSuccess: (submitted) => {
          idempotency.renew();
          notifySuccess('Submitted for approval', `Version ${submitted.number} now waits for a second pharmacist to approve it.`);
          onClose();
        },
      },
    );
  };

  return (
    <Modal opened onClose={onClose} title={`Submit version ${version.number} for approval`} size="md">
      <Stack gap="md">
        <Text size="sm">
          A second pharmacist checks and approves the version before it is used. Until then the draft cannot be edited; withdraw it to
          change it again.
        </Text>
        {submitVersion.isError ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not submitted" role="alert">
            {errorMessage(submitVersion.error)}
          </Alert>
        ) : null}
        <Textarea
          label="Note for the approver"
          description="What changed and why (optional)"
          value={note}
          onChange={(event) => setNote(event.currentTarget.value)}
          maxLength={NOTE_MAX}
          autosize
          minRows={2}
          data-autofocus
        />
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button leftSection={<IconSend size={16} aria-hidden />} onClick={submit} loading={submitVersion.isPending}>
            Submit for approval
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
