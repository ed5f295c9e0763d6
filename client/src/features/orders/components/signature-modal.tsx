import type { ReactNode } from 'react';
import { Alert, Button, Group, Modal, PasswordInput, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconSignature } from '@tabler/icons-react';

export interface SignatureModalProps {
  title: string;
  /** What is being signed, shown above the password. */
  children: ReactNode;
  confirmLabel: string;
  pending: boolean;
  /** Any other refusal, shown above the field. */
  refusal: string | null;
  /** `wrongPassword` puts the server's message beside the field and clears it for another try. */
  onSign: (password: string, handlers: { wrongPassword: (message: string) => void }) => void;
  onClose: () => void;
}

/** Every signature is the signed-in person's password, typed again at the moment of signing. */
export function SignatureModal({ title, children, confirmLabel, pending, refusal, onSign, onClose }: SignatureModalProps) {
  const form = useForm({
    initialValues: { password: '' },
    validate: { password: (value) => (value ? null : 'Enter your password to sign') },
  });
  const wrongPassword = (message: string) => {
    form.setFieldValue('password', '');
    form.setFieldError('password', message);
  };

  return (
    <Modal opened onClose={onClose} title={title} size="lg">
      <form onSubmit={form.onSubmit(({ password }) => onSign(password, { wrongPassword }))} noValidate>
        <Stack gap="md">
          {children}
          {refusal ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not signed" role="alert">
              {refusal}
            </Alert>
          ) : null}
          <PasswordInput
            label="Your password"
            description="Type your password again to sign"
            autoComplete="current-password"
            size="md"
            data-autofocus
            {...form.getInputProps('password')}
          />
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Back
            </Button>
            <Button type="submit" leftSection={<IconSignature size={16} aria-hidden />} loading={pending}>
              {confirmLabel}
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
