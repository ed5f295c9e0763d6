import { useState } from 'react';
import { Alert, Button, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconInfoCircle } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { loginSchema, type LoginRequest } from '@lockstep/shared';
import { isApiRequestError } from '@/lib/api-error';
import { applyServerErrors } from '@/lib/form-errors';
import type { Session } from '@/lib/auth/session-store';
import { useLogin } from '../api/login';

export const WRONG_CREDENTIALS_MESSAGE = 'Username or password is incorrect';

export function useSignInForm() {
  return useForm<LoginRequest>({
    initialValues: { username: '', password: '' },
    validate: zod4Resolver(loginSchema),
  });
}

export type SignInFormHandle = ReturnType<typeof useSignInForm>;

export interface SignInFormProps {
  /** Owned by the screen, so the demo-account buttons can fill it. */
  form: SignInFormHandle;
  onSignedIn: (session: Session) => void;
  /** Shown above the form, e.g. after a session expired. */
  notice?: string;
}

export function SignInForm({ form, onSignedIn, notice }: SignInFormProps) {
  const login = useLogin();
  const [failure, setFailure] = useState<string | null>(null);

  const submit = form.onSubmit((values) => {
    setFailure(null);
    login.mutate(loginSchema.parse(values), {
      onSuccess: onSignedIn,
      onError: (error) => {
        if (isApiRequestError(error) && error.status === 401) {
          setFailure(WRONG_CREDENTIALS_MESSAGE);
          form.setFieldValue('password', '');
          return;
        }
        const other = applyServerErrors(form, error);
        setFailure(other.length > 0 ? other.join(' ') : null);
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Sign in">
      <Stack gap="md">
        {notice && !failure ? (
          <Alert color="blue" variant="light" icon={<IconInfoCircle aria-hidden />}>
            {notice}
          </Alert>
        ) : null}
        {failure ? (
          // No Alert title: it would become the alert's label, and "Username or password is
          // incorrect" would then match a search for the Password field's label.
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} role="alert">
            <Text size="sm" fw={600}>
              {failure}
            </Text>
            {failure === WRONG_CREDENTIALS_MESSAGE ? <Text size="sm">Check both and try again. Passwords are case-sensitive.</Text> : null}
          </Alert>
        ) : null}
        <TextInput
          label="Username"
          autoComplete="username"
          autoCapitalize="none"
          spellCheck={false}
          size="md"
          {...form.getInputProps('username')}
        />
        <PasswordInput label="Password" autoComplete="current-password" size="md" {...form.getInputProps('password')} />
        <Button type="submit" size="md" loading={login.isPending} fullWidth>
          Sign in
        </Button>
      </Stack>
    </form>
  );
}
