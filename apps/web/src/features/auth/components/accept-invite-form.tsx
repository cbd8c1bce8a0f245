import { Button, Group, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { acceptInviteRequestSchema } from '@limitbook/contracts';
import { useState } from 'react';
import { applyServerErrors } from '@/components/form/server-errors';
import { useAcceptInvite } from '../api/accept-invite';
import { FormAlert } from './form-alert';
import { matchingPasswords, newPasswordPairSchema } from './new-password-fields';
import { NewPasswordInputs } from './new-password-inputs';

const schema = matchingPasswords(newPasswordPairSchema.extend({ name: acceptInviteRequestSchema.shape.name }));

export function AcceptInviteForm({ token, onSuccess }: { token: string; onSuccess: () => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { name: '', password: '', confirm: '' },
    validate: schemaResolver(schema, { sync: true }),
  });
  const accept = useAcceptInvite();

  return (
    <form
      noValidate
      onSubmit={form.onSubmit((values) => {
        setFormError(null);
        accept.mutate(
          { token, name: values.name.trim(), password: values.password },
          { onSuccess, onError: (error) => setFormError(applyServerErrors(form, error, ['name', 'password'])) },
        );
      })}
    >
      {formError && <FormAlert>{formError}</FormAlert>}
      <Stack gap="md">
        <TextInput
          label="Your name"
          description="As colleagues will see it on revisions and records."
          autoComplete="name"
          required
          data-autofocus
          key={form.key('name')}
          {...form.getInputProps('name')}
        />
        <NewPasswordInputs form={form} label="Choose a password" repeatLabel="Repeat the password" />
        <Group justify="flex-end" mt={4}>
          <Button type="submit" loading={accept.isPending}>
            Create my account
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
