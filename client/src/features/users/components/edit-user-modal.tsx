import { useState } from 'react';
import { Alert, Button, Group, Modal, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { PASSWORD_MIN_LENGTH, type User, type Ward } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import { useUpdateUser } from '@/api/users/update-user';
import { editFormValuesOf, editUserFormSchema, userChanges, type EditUserFormValues } from '../utils/user-form-schemas';
import { RoleSelect } from './role-select';
import { WardMultiSelect } from './ward-multi-select';

export interface EditUserModalProps {
  user: User;
  wards: Ward[];
  onClose: () => void;
}

/** Mounted only while open, so its form always starts from the user's current details. */
export function EditUserModal({ user, wards, onClose }: EditUserModalProps) {
  const updateUser = useUpdateUser();
  // One key per opening of the dialog: a double-click or a retry saves once.
  const idempotency = useIdempotencyKey();
  const [formAlert, setFormAlert] = useState<string[]>([]);
  const form = useForm<EditUserFormValues>({
    initialValues: editFormValuesOf(user),
    validate: zod4Resolver(editUserFormSchema),
  });

  const submit = form.onSubmit((values) => {
    setFormAlert([]);
    const changes = userChanges(user, values);
    if (Object.keys(changes).length === 0) {
      onClose();
      return;
    }
    updateUser.mutate(
      { id: user.id, changes, idempotencyKey: idempotency.key },
      {
        onSuccess: (saved) => {
          idempotency.renew();
          const passwordNote = changes.password ? ' The new password works from their next sign-in.' : '';
          notifySuccess('Changes saved', `${saved.displayName} (${saved.username}) is updated.${passwordNote}`);
          onClose();
        },
        onError: (error) => setFormAlert(applyServerErrors(form, error)),
      },
    );
  });

  return (
    <Modal opened onClose={onClose} title={`Edit ${user.username}`} size="md">
      <form onSubmit={submit} noValidate>
        <Stack gap="sm">
          {formAlert.length > 0 ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The changes were not saved">
              {formAlert.join(' ')}
            </Alert>
          ) : null}
          <Text size="sm" c="dimmed">
            Username: {user.username} (cannot be changed)
          </Text>
          <TextInput label="Display name" withAsterisk data-autofocus {...form.getInputProps('displayName')} />
          <RoleSelect
            label="Role"
            withAsterisk
            value={form.values.role}
            onChange={(role) => {
              if (role) form.setFieldValue('role', role);
            }}
            error={form.errors.role}
          />
          <WardMultiSelect
            label="Wards"
            placeholder="Choose wards"
            wards={wards}
            value={form.values.wardIds}
            onChange={(ids) => form.setFieldValue('wardIds', ids)}
            error={form.errors.wardIds}
          />
          <PasswordInput
            label="New password"
            description={`Leave blank to keep the current password. At least ${PASSWORD_MIN_LENGTH} characters.`}
            autoComplete="new-password"
            {...form.getInputProps('password')}
          />
          <Group justify="flex-end" mt="sm">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={updateUser.isPending}>
              Save changes
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
