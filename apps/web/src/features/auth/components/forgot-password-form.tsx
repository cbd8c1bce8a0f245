import { Anchor, Button, Group, Stack, Text, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { forgotPasswordRequestSchema, type ForgotPasswordRequest } from '@limitbook/contracts';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { useRequestPasswordReset } from '../api/forgot-password';
import { FormAlert } from './form-alert';

export function ForgotPasswordForm({ defaultEmail = '' }: { defaultEmail?: string }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<ForgotPasswordRequest>({
    mode: 'uncontrolled',
    initialValues: { email: defaultEmail },
    validate: schemaResolver(forgotPasswordRequestSchema, { sync: true }),
  });
  const request = useRequestPasswordReset();

  if (sentTo) {
    return (
      <Stack gap="md">
        <FormAlert tone="info">
          If an account exists for <strong>{sentTo}</strong>, a link to choose a new password is on its way. The link works
          once and expires after a while.
        </FormAlert>
        <Anchor component={Link} to={paths.auth.signIn.getHref(undefined, sentTo)}>
          Back to sign in
        </Anchor>
      </Stack>
    );
  }

  return (
    <form
      noValidate
      onSubmit={form.onSubmit((values) => {
        setFormError(null);
        const email = values.email.trim();
        request.mutate(
          { email },
          { onSuccess: () => setSentTo(email), onError: (error) => setFormError(applyServerErrors(form, error, ['email'])) },
        );
      })}
    >
      {formError && <FormAlert>{formError}</FormAlert>}
      <Stack gap="md">
        <TextInput label="E-mail" type="email" autoComplete="username" required data-autofocus key={form.key('email')} {...form.getInputProps('email')} />
        <Group justify="space-between" mt={4}>
          <Anchor component={Link} to={paths.auth.signIn.getHref()} size="sm">
            Back to sign in
          </Anchor>
          <Button type="submit" loading={request.isPending}>
            Send reset link
          </Button>
        </Group>
        <Text size="xs" c="dimmed">
          No mail after a few minutes? Ask your Limitbook administrator.
        </Text>
      </Stack>
    </form>
  );
}
