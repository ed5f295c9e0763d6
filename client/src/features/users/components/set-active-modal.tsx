import { Alert, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';
import type { User } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useUpdateUser } from '@/api/users/update-user';

export interface SetActiveModalProps {
  user: User;
  onClose: () => void;
}

/** Confirms deactivating (or reactivating) an account; the account is kept for the audit trail. */
export function SetActiveModal({ user, onClose }: SetActiveModalProps) {
  const updateUser = useUpdateUser();
  // One key per opening of the dialog: a double-click or a retry changes the account once.
  const idempotency = useIdempotencyKey();
  const activate = !user.active;
  const verb = activate ? 'Reactivate' : 'Deactivate';

  const confirm = () =>
    updateUser.mutate(
      { id: user.id, changes: { active: activate }, idempotencyKey: idempotency.key },
      {
        onSuccess: (saved) => {
          idempotency.renew();
          notifySuccess(
            activate ? 'User reactivated' : 'User deactivated',
            activate ? `${saved.displayName} can sign in again.` : `${saved.displayName} can no longer sign in.`,
          );
          onClose();
        },
      },
    );

  return (
    <Modal opened onClose={onClose} title={`${verb} ${user.username}?`} size="sm">
      <Stack gap="md">
        <Text size="sm">
          {activate
            ? `${user.displayName} will be able to sign in again with their current password.`
            : `${user.displayName} will no longer be able to sign in. Their records stay in the audit trail, and you can reactivate the account later.`}
        </Text>
        {updateUser.isError ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title={`Could not ${verb.toLowerCase()}`}>
            {errorMessage(updateUser.error)}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose} data-autofocus>
            Cancel
          </Button>
          <Button color={activate ? undefined : 'red'} onClick={confirm} loading={updateUser.isPending}>
            {verb}
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
