import { Alert, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { IconAlertCircle, IconTrash } from '@tabler/icons-react';
import type { LibraryVersion } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useDiscardVersion } from '@/api/library/discard-version';

export interface DiscardModalProps {
  version: LibraryVersion;
  onClose: () => void;
  onDiscarded: () => void;
}

export function DiscardModal({ version, onClose, onDiscarded }: DiscardModalProps) {
  const discard = useDiscardVersion();
  // One key per opening of the dialog: a double-click or a retry is one discard.
  const idempotency = useIdempotencyKey();
  const confirm = () =>
    discard.mutate(
      { version, idempotencyKey: idempotency.key },
      {
        onSuccess: () => {
          idempotency.renew();
          notifySuccess('Draft discarded', `Draft version ${version.number} of ${version.wardName}'s library was deleted.`);
          onDiscarded();
          onClose();
        },
      },
    );

  return (
    <Modal opened onClose={onClose} title={`Discard draft version ${version.number}?`} size="sm">
      <Stack gap="md">
        <Text size="sm">
          The draft and its {version.ruleCount} {version.ruleCount === 1 ? 'rule' : 'rules'} are deleted. The active version is not changed.
        </Text>
        {discard.isError ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not discarded" role="alert">
            {errorMessage(discard.error)}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose} data-autofocus>
            Keep the draft
          </Button>
          <Button color="red" leftSection={<IconTrash size={16} aria-hidden />} onClick={confirm} loading={discard.isPending}>
            Discard draft
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
