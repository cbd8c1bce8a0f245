import { Anchor, Button, Group, Stack } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { useResetPassword } from '../api/reset-password';
import { FormAlert } from './form-alert';
import { matchingPasswords, newPasswordPairSchema } from './new-password-fields';
import { NewPasswordInputs } from './new-password-inputs';

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
        <NewPasswordInputs form={form} label="New password" repeatLabel="Repeat the new password" autoFocus />
        <Group justify="flex-end" mt={4}>
          <Button type="submit" loading={reset.isPending}>
            Save new password
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
