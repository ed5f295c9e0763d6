import { SigningPasswordInput } from './signing-password-input';
import type { ReactNode } from 'react';
import { type ModalProps } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconSignature } from '@tabler/icons-react';
import { isApiRequestError, isSignatureError } from '@/lib/api-error';
import { FormModal } from './form-modal';

export interface SignatureHandlers {
  /**
   * A refusal of the password typed goes beside the field, which is cleared for another try;
   * says whether it was one (anything else is the caller's to show).
   */
  passwordRefused: (error: unknown) => boolean;
  clearPassword: () => void;
}

export interface SignatureModalProps {
  title: string;
  size?: ModalProps['size'];
  /** What is being signed, shown above the password. */
  children: ReactNode;
  confirmLabel: string;
  pending: boolean;
  /** Any other refusal, shown above the field. */
  refusal: string | null;
  refusalTitle?: string;
  passwordDescription?: string;
  backLabel?: string;
  /** Shown in place of the password and buttons once this signature can no longer be given. */
  instead?: ReactNode;
  onSign: (password: string, handlers: SignatureHandlers) => void;
  onClose: () => void;
}

/** Every signature is the signed-in person's password, typed again at the moment of signing. */
export function SignatureModal({
  title,
  size,
  children,
  confirmLabel,
  pending,
  refusal,
  refusalTitle = 'Not signed',
  passwordDescription = 'Type your password again to sign',
  backLabel,
  instead,
  onSign,
  onClose,
}: SignatureModalProps) {
  const form = useForm({
    initialValues: { password: '' },
    validate: { password: (value) => (value ? null : 'Enter your password to sign') },
  });
  const clearPassword = () => form.setFieldValue('password', '');
  const passwordRefused = (error: unknown) => {
    if (!isSignatureError(error) || !isApiRequestError(error)) return false;
    clearPassword();
    form.setFieldError('password', error.message);
    return true;
  };

  return (
    <FormModal
      title={title}
      size={size}
      onClose={onClose}
      onSubmit={form.onSubmit(({ password }) => onSign(password, { passwordRefused, clearPassword }))}
      refusal={refusal}
      refusalTitle={refusalTitle}
      backLabel={backLabel}
      confirm={{ label: confirmLabel, icon: <IconSignature size={16} aria-hidden />, pending }}
      instead={instead}
      field={<SigningPasswordInput description={passwordDescription} data-autofocus {...form.getInputProps('password')} />}
    >
      {children}
    </FormModal>
  );
}
