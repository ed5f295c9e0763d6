import { PasswordInput, type PasswordInputProps } from '@mantine/core';

/** The re-entered password that signs an action: every signature in the app asks for it the same way. */
export function SigningPasswordInput({ description = 'Type your password again to sign', ...props }: PasswordInputProps) {
  return <PasswordInput label="Your password" description={description} autoComplete="current-password" size="md" {...props} />;
}
