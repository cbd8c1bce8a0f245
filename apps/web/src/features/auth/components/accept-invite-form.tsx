import { Button, Group, PasswordInput, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { acceptInviteRequestSchema } from '@limitbook/contracts';
import { useState } from 'react';
import { applyServerErrors } from '@/components/form/server-errors';
import { useAcceptInvite } from '../api/accept-invite';
import { FormAlert } from './form-alert';
import { matchingPasswords, newPasswordPairSchema } from './new-password-fields';

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
        <PasswordInput
          label="Choose a password"
          description="At least 12 characters. A few unrelated words make a strong passphrase."
          autoComplete="new-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <PasswordInput label="Repeat the password" autoComplete="new-password" required key={form.key('confirm')} {...form.getInputProps('confirm')} />
        <Group justify="flex-end" mt={4}>
          <Button type="submit" loading={accept.isPending}>
            Create my account
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
