import { Alert, Button, Group, Paper, Stack, Text, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { houseMethodPrefix, methodDesignSlugSchema } from '@limitbook/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { PageHeader } from '@/components/layout/page-header';
import { paths } from '@/config/paths';
import { useCreateMethodDesign } from '../api/create-method-design';
import { ApiError, isApiError } from '@/lib/api-client';
import { definitionProblems, emptyDefinition } from '../lib/definition';

function slugFrom(name: string): string {
  return name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .replace(/^[^a-z]+/, '')
    .slice(0, 60)
    .replace(/-+$/, '');
}

/** Starts an in-house method: a name, its id and a description; the designer does the rest. */
export function CreateMethodForm() {
  const navigate = useNavigate();
  const create = useCreateMethodDesign();
  const [slugTouched, setSlugTouched] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({
    mode: 'controlled',
    initialValues: { name: '', slug: '', description: '' },
    validate: {
      name: (value) => (value.trim() ? null : 'Name is required'),
      slug: (value) => {
        const parsed = methodDesignSlugSchema.safeParse(value);
        return parsed.success ? null : (parsed.error.issues[0]?.message ?? 'Not a valid id');
      },
    },
  });

  const submit = form.onSubmit((values) => {
    setFormError(null);
    create.mutate(
      { slug: values.slug, definition: { ...emptyDefinition(values.name.trim()), description: values.description.trim() } },
      {
        onSuccess: () => {
          notifications.show({ color: 'verdigris', title: 'Method started', message: `${values.name.trim()} is a draft; define its inputs and formulas.` });
          navigate(paths.methods.design.getHref(`${houseMethodPrefix}${values.slug}`));
        },
        onError: (error) => {
          // The server names fields inside the definition (`definition.name`); the form has them at the top level.
          const placed = isApiError(error) ? new ApiError({ ...error.body, fields: definitionProblems(error.fields) }) : error;
          setFormError(applyServerErrors(form, placed, ['name', 'slug', 'description']));
        },
      },
    );
  });

  return (
    <Stack gap="lg" maw={720}>
      <PageHeader eyebrow="Methods" title="New in-house method" description="A formula method your team designs: inputs with units, formulas, checks and a test table. It is released through review like a standard." />
      <Paper component="form" onSubmit={submit} p="lg" withBorder noValidate>
        <Stack gap="md">
          {formError && (
            <Alert color="redline" title="Not created" role="alert">
              {formError}
            </Alert>
          )}
          <TextInput
            label="Name"
            required
            placeholder="O-ring squeeze in a gland"
            {...form.getInputProps('name')}
            onChange={(event) => {
              const name = event.currentTarget.value;
              form.setFieldValue('name', name);
              if (!slugTouched) form.setFieldValue('slug', slugFrom(name));
            }}
          />
          <TextInput
            label="Id"
            required
            description={`Calculator blocks and records cite it as ${houseMethodPrefix}${form.values.slug || '…'}; it cannot change later.`}
            leftSection={<Text size="xs" c="dimmed" pl={4}>{houseMethodPrefix}</Text>}
            leftSectionWidth={56}
            {...form.getInputProps('slug')}
            onChange={(event) => {
              setSlugTouched(true);
              form.setFieldValue('slug', event.currentTarget.value);
            }}
            spellCheck={false}
          />
          <Textarea label="Description" autosize minRows={3} {...form.getInputProps('description')} />
          <Group justify="flex-end">
            <Button type="submit" loading={create.isPending}>
              Create and open the designer
            </Button>
          </Group>
        </Stack>
      </Paper>
    </Stack>
  );
}
