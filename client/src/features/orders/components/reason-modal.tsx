import type { ReactNode } from 'react';
import { Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { MIN_REASON_LENGTH, reasonRequestSchema } from '@lockstep/shared';
import { FormModal } from '@/components/dialogs/form-modal';

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
  return (
    <FormModal
      title={title}
      onClose={onClose}
      onSubmit={form.onSubmit(({ reason }) => onConfirm(reason.trim()))}
      refusal={refusal}
      refusalTitle="Not done"
      confirm={{ label: confirmLabel, color: confirmColor, pending }}
      field={
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
      }
    >
      {children}
    </FormModal>
  );
}
