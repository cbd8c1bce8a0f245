import { Button, Group, Modal, Select, Stack, Text, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { inviteUserRequestSchema, roleSchema, type InviteUserRequest, type Role } from '@limitbook/contracts';
import { useState } from 'react';
import { applyServerErrors } from '@/components/form/server-errors';
import { isApiError } from '@/lib/api-client';
import { useInviteUser } from '../api/invite-user';
import { roleDescriptions, roleOptions } from './role-options';

type Props = { opened: boolean; onClose: () => void };

export function InviteUserModal({ opened, onClose }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<InviteUserRequest>({
    mode: 'controlled',
    initialValues: { email: '', name: '', role: 'reader' },
    validate: schemaResolver(inviteUserRequestSchema, { sync: true }),
  });
  const invite = useInviteUser();

  const close = () => {
    form.reset();
    setFormError(null);
    invite.reset();
    onClose();
  };

  return (
    <Modal opened={opened} onClose={close} title="Invite a colleague" size="md">
      <form
        noValidate
        onSubmit={form.onSubmit((values) => {
          setFormError(null);
          invite.mutate(
            { email: values.email.trim(), name: values.name.trim(), role: values.role },
            {
              onSuccess: () => {
                notifications.show({ color: 'verdigris', title: 'Invitation sent', message: `${values.name.trim()} will get a link at ${values.email.trim()}.` });
                close();
              },
              onError: (error) => {
                // An address already in use comes back as a conflict without a field.
                if (isApiError(error) && error.code === 'CONFLICT' && Object.keys(error.fields).length === 0) {
                  form.setFieldError('email', error.message);
                  return;
                }
                setFormError(applyServerErrors(form, error, ['email', 'name', 'role']));
              },
            },
          );
        })}
      >
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            They receive an e-mail with a link to set their password. The link works once.
          </Text>
          {formError && (
            <Text role="alert" c="redline.7" size="sm">
              {formError}
            </Text>
          )}
          <TextInput label="E-mail" type="email" required data-autofocus {...form.getInputProps('email')} />
          <TextInput label="Name" required autoComplete="off" {...form.getInputProps('name')} />
          <Select
            label="Role"
            required
            allowDeselect={false}
            data={roleOptions}
            description={roleDescriptions[form.values.role]}
            {...form.getInputProps('role')}
            onChange={(value) => {
              const parsed = roleSchema.safeParse(value);
              if (parsed.success) form.setFieldValue('role', parsed.data satisfies Role);
            }}
          />
          <Group justify="flex-end" mt="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" loading={invite.isPending}>
              Send invitation
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
