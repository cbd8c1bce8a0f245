import { Anchor, Button, Group, PasswordInput, Stack } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { useResetPassword } from '../api/reset-password';
import { FormAlert } from './form-alert';
import { matchingPasswords, newPasswordPairSchema } from './new-password-fields';

const schema = matchingPasswords(newPasswordPairSchema);

export function ResetPasswordForm({ token, onSuccess }: { token: string; onSuccess: () => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ mode: 'uncontrolled', initialValues: { password: '', confirm: '' }, validate: schemaResolver(schema, { sync: true }) });
  const reset = useResetPassword();

  return (
    <form
      noValidate
      onSubmit={form.onSubmit((values) => {
        setFormError(null);
        reset.mutate(
          { token, password: values.password },
          { onSuccess, onError: (error) => setFormError(applyServerErrors(form, error, ['password'])) },
        );
      })}
    >
      {formError && (
        <FormAlert>
          {formError}{' '}
          <Anchor component={Link} to={paths.auth.forgotPassword.getHref()} inherit>
            Request a new link
          </Anchor>
        </FormAlert>
      )}
      <Stack gap="md">
        <PasswordInput
          label="New password"
          description="At least 12 characters. A few unrelated words make a strong passphrase."
          autoComplete="new-password"
          required
          data-autofocus
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <PasswordInput label="Repeat the new password" autoComplete="new-password" required key={form.key('confirm')} {...form.getInputProps('confirm')} />
        <Group justify="flex-end" mt={4}>
          <Button type="submit" loading={reset.isPending}>
            Save new password
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
