import { Anchor, Button, Group, PasswordInput, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { signInRequestSchema, type SignInRequest } from '@limitbook/contracts';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { useSignIn } from '../api/sign-in';
import { FormAlert } from './form-alert';

function waitHint(seconds: number | null) {
  if (!seconds) return 'Wait a few minutes, then try again.';
  if (seconds < 90) return `Try again in ${seconds} seconds.`;
  return `Try again in about ${Math.ceil(seconds / 60)} minutes.`;
}

function messageFor(error: unknown, setErrors: (errors: Record<string, string>) => void): string | null {
  // Never say which of the two was wrong.
  if (isApiError(error) && error.status === 401) return 'The e-mail or password is not right. Check both and try again.';
  if (isApiError(error) && error.code === 'RATE_LIMITED') return `Too many sign-in attempts. ${waitHint(error.retryAfter)}`;
  return applyServerErrors({ setErrors }, error, ['email', 'password']);
}

type Props = { defaultEmail?: string; notice?: string; onSuccess: () => void };

export function SignInForm({ defaultEmail = '', notice, onSuccess }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<SignInRequest>({
    mode: 'uncontrolled',
    initialValues: { email: defaultEmail, password: '' },
    validate: schemaResolver(signInRequestSchema, { sync: true }),
  });
  const signIn = useSignIn({
    onSuccess,
    onError: (error) => setFormError(messageFor(error, form.setErrors)),
  });

  return (
    <form
      noValidate
      onSubmit={form.onSubmit((values) => {
        setFormError(null);
        signIn.mutate({ email: values.email.trim(), password: values.password });
      })}
    >
      {formError ? <FormAlert>{formError}</FormAlert> : notice && <FormAlert tone="info">{notice}</FormAlert>}
      <Stack gap="md">
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="username"
          required
          data-autofocus
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput label="Password" autoComplete="current-password" required key={form.key('password')} {...form.getInputProps('password')} />
        <Group justify="space-between" align="center" mt={4}>
          <Anchor component={Link} to={paths.auth.forgotPassword.getHref()} size="sm">
            Forgot your password?
          </Anchor>
          <Button type="submit" loading={signIn.isPending}>
            Sign in
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
