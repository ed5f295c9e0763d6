import type { FormEvent, ReactNode } from 'react';
import { Alert, Button, Group, Modal, Stack, type ModalProps } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';

export interface FormModalProps {
  title: string;
  size?: ModalProps['size'];
  onClose: () => void;
  onSubmit: (event?: FormEvent<HTMLFormElement>) => void;
  /** What the action is about, above the field. */
  children?: ReactNode;
  /** Why the server refused, when no field shows it: above the field, under `refusalTitle`. */
  refusal: string | null;
  refusalTitle: string;
  /** The one thing typed: the signer's password, or a reason. */
  field: ReactNode;
  backLabel?: string;
  confirm: { label: string; color?: string; icon?: ReactNode; pending: boolean };
  /** Shown in place of the field and buttons once the action is no longer open here. */
  instead?: ReactNode;
}

/** A dialog that asks for one thing and acts on it: a signature or a reason, with Back and the action. */
export function FormModal({
  title,
  size = 'lg',
  onClose,
  onSubmit,
  children,
  refusal,
  refusalTitle,
  field,
  backLabel = 'Back',
  confirm,
  instead,
}: FormModalProps) {
  return (
    <Modal opened onClose={onClose} title={title} size={size}>
      <form onSubmit={onSubmit} noValidate>
        <Stack gap="md">
          {children}
          {refusal ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title={refusalTitle} role="alert">
              {refusal}
            </Alert>
          ) : null}
          {instead ?? (
            <>
              {field}
              <Group justify="flex-end">
                <Button variant="default" onClick={onClose}>
                  {backLabel}
                </Button>
                <Button type="submit" color={confirm.color} leftSection={confirm.icon} loading={confirm.pending}>
                  {confirm.label}
                </Button>
              </Group>
            </>
          )}
        </Stack>
      </form>
    </Modal>
  );
}
