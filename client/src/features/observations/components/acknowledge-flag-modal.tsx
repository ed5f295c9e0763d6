import { useState, type FormEvent } from 'react';
import { Alert, Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';
import type { FlagResponse } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useAcknowledgeFlag } from '@/api/orders/acknowledge-flag';
import { acknowledgeNoteError } from '../utils/flags';
import { SeverityBadge } from '@/components/ui/severity-badge';

export interface AcknowledgeFlagModalProps {
  orderId: number;
  /** The flag to acknowledge; null keeps the modal closed. */
  flag: FlagResponse | null;
  onClose: () => void;
}

/** A flag is closed only with a note of what was done. */
export function AcknowledgeFlagModal({ orderId, flag, onClose }: AcknowledgeFlagModalProps) {
  const acknowledge = useAcknowledgeFlag();
  // One key per opening of the dialog (it stays mounted, so closing renews it): a double-click or
  // a retry acknowledges once.
  const idempotency = useIdempotencyKey();
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string | null>(null);

  const close = () => {
    setNote('');
    setNoteError(null);
    acknowledge.reset();
    idempotency.renew();
    onClose();
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!flag) return;
    const problem = acknowledgeNoteError(note);
    setNoteError(problem);
    if (problem) return;
    acknowledge.mutate(
      { orderId, flagId: flag.id, note: note.trim(), idempotencyKey: idempotency.key },
      {
        onSuccess: () => {
          notifySuccess('Flag acknowledged', flag.message);
          close();
        },
        onError: (error) => {
          const field = isApiRequestError(error) ? error.errors.find((e) => e.field === 'note') : undefined;
          if (field) setNoteError(field.message);
        },
      },
    );
  };

  const failed = acknowledge.isError && !noteError;
  return (
    <Modal opened={flag !== null} onClose={close} title="Acknowledge flag" size="lg">
      {flag ? (
        <form onSubmit={submit} noValidate>
          <Stack gap="md">
            <Group gap="sm">
              <SeverityBadge severity={flag.severity} />
              <Text fw={600}>{flag.message}</Text>
            </Group>
            <Text size="sm">
              <Text span fw={600} inherit>
                Action:{' '}
              </Text>
              {flag.action}
            </Text>
            {failed ? (
              <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The flag was not acknowledged">
                {errorMessage(acknowledge.error)}
              </Alert>
            ) : null}
            <Textarea
              label="What was done"
              description="Recorded with your name and the time, for the whole team to see"
              autosize
              minRows={3}
              withAsterisk
              data-autofocus
              value={note}
              onChange={(event) => {
                setNote(event.currentTarget.value);
                if (noteError) setNoteError(acknowledgeNoteError(event.currentTarget.value));
              }}
              error={noteError}
            />
            <Group justify="flex-end">
              <Button variant="default" onClick={close}>
                Cancel
              </Button>
              <Button type="submit" loading={acknowledge.isPending}>
                Acknowledge flag
              </Button>
            </Group>
          </Stack>
        </form>
      ) : null}
    </Modal>
  );
}
