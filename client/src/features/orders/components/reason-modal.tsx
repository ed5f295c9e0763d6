import type { ReactNode } from 'react';
import { Alert, Button, Group, Modal, Stack, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { MIN_REASON_LENGTH, reasonRequestSchema } from '@lockstep/shared';

export interface ReasonModalProps {
  title: string;
  /** What the action does, above the field. */
  children?: ReactNode;
  label: string;
  description?: string;
  confirmLabel: string;
  confirmColor?: string;
  pending: boolean;
  /** Why the server refused, shown above the field. */
  refusal: string | null;
  onConfirm: (reason: string) => void;
  onClose: () => void;
}

/** An action that records why: return with a query, reject, cancel. Ten characters at least. */
export function ReasonModal({
  title,
  children,
  label,
  description,
  confirmLabel,
  confirmColor,
  pending,
  refusal,
  onConfirm,
  onClose,
}: ReasonModalProps) {
  const form = useForm({ initialValues: { reason: '' }, validate: zod4Resolver(reasonRequestSchema) });
  const submit = form.onSubmit(({ reason }) => onConfirm(reason.trim()));
  return (
    <Modal opened onClose={onClose} title={title} size="lg">
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          {children}
          {refusal ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not done" role="alert">
              {refusal}
            </Alert>
          ) : null}
          <Textarea
            label={label}
            description={description ?? `At least ${MIN_REASON_LENGTH} characters`}
            autosize
            minRows={3}
            size="md"
            withAsterisk
            data-autofocus
            {...form.getInputProps('reason')}
          />
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Back
            </Button>
            <Button type="submit" color={confirmColor} loading={pending}>
              {confirmLabel}
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
