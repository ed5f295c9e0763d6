import { useState } from 'react';
import { Alert, Button, Group, Modal, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { createUserSchema, PASSWORD_MIN_LENGTH, type Ward } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { isApiRequestError } from '@/lib/api-error';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import { useCreateUser } from '@/api/users/create-user';
import { createUserFormSchema, emptyCreateUserForm, type CreateUserFormValues } from '../utils/user-form-schemas';
import { RoleSelect } from './role-select';
import { WardMultiSelect } from './ward-multi-select';

export interface CreateUserModalProps {
  opened: boolean;
  onClose: () => void;
  wards: Ward[];
}

export function CreateUserModal({ opened, onClose, wards }: CreateUserModalProps) {
  const createUser = useCreateUser();
  // One key per opening of the dialog (it stays mounted, so closing renews it): a double-click or
  // a retry creates one account.
  const idempotency = useIdempotencyKey();
  const [formAlert, setFormAlert] = useState<string[]>([]);
  const form = useForm<CreateUserFormValues>({
    initialValues: emptyCreateUserForm,
    validate: zod4Resolver(createUserFormSchema),
  });

  const close = () => {
    form.reset();
    setFormAlert([]);
    createUser.reset();
    idempotency.renew();
    onClose();
  };

  const submit = form.onSubmit((values) => {
    setFormAlert([]);
    // Already validated by the resolver; parsing again trims and narrows the types.
    const input = createUserSchema.parse(values);
    createUser.mutate(
      { input, idempotencyKey: idempotency.key },
      {
        onSuccess: (user) => {
          notifySuccess('User created', `${user.displayName} (${user.username}) can now sign in.`);
          close();
        },
        onError: (error) => {
          // 409: the username is taken; it belongs beside the username, not in an alert.
          if (isApiRequestError(error) && error.status === 409 && error.errors.length === 0) {
            form.setFieldError('username', error.message);
            return;
          }
          setFormAlert(applyServerErrors(form, error));
        },
      },
    );
  });

  return (
    <Modal opened={opened} onClose={close} title="New user" size="md">
      <form onSubmit={submit} noValidate>
        <Stack gap="sm">
          {formAlert.length > 0 ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The user was not created">
              {formAlert.join(' ')}
            </Alert>
          ) : null}
          <TextInput
            label="Username"
            description="Lower-case letters, digits, dots, dashes and underscores"
            autoComplete="off"
            withAsterisk
            data-autofocus
            {...form.getInputProps('username')}
          />
          <TextInput label="Display name" autoComplete="off" withAsterisk {...form.getInputProps('displayName')} />
          <RoleSelect
            label="Role"
            placeholder="Choose a role"
            withAsterisk
            value={form.values.role}
            onChange={(role) => form.setFieldValue('role', role)}
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
            label="Password"
            description={`At least ${PASSWORD_MIN_LENGTH} characters`}
            autoComplete="new-password"
            withAsterisk
            {...form.getInputProps('password')}
          />
          <Group justify="flex-end" mt="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" loading={createUser.isPending}>
              Create user
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
