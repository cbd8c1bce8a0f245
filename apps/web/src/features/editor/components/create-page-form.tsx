import { Button, Group, Paper, Select, Stack, TagsInput, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { documentNumberSchema, maxPageTags, pageTagSchema, pageTitleSchema, type Page } from '@limitbook/contracts';
import { useState } from 'react';
import { applyServerErrors } from '@/components/form/server-errors';
import { isApiError } from '@/lib/api-client';
import { useCollections } from '../api/get-collections';
import { useCreatePage } from '../api/create-page';

type Values = { documentNumber: string; collectionId: string; title: string; tags: string[] };

const fields = ['documentNumber', 'collectionId', 'title', 'tags'] as const;

function firstIssue(result: { success: boolean; error?: { issues: { message: string }[] } }): string | null {
  return result.success ? null : (result.error?.issues[0]?.message ?? 'Invalid value');
}

type Props = { onCreated: (page: Page) => void; onCancel: () => void };

export function CreatePageForm({ onCreated, onCancel }: Props) {
  const collections = useCollections();
  const create = useCreatePage();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: { documentNumber: '', collectionId: '', title: '', tags: [] },
    validate: {
      documentNumber: (value) => firstIssue(documentNumberSchema.safeParse(value)),
      collectionId: (value) => (value ? null : 'Pick a collection'),
      title: (value) => firstIssue(pageTitleSchema.safeParse(value)),
      tags: (value) => value.map((tag) => firstIssue(pageTagSchema.safeParse(tag))).find(Boolean) ?? null,
    },
  });

  return (
    <Paper p="xl" maw={640}>
      <form
        noValidate
        onSubmit={form.onSubmit((values) => {
          setFormError(null);
          create.mutate(
            { documentNumber: values.documentNumber.trim(), collectionId: values.collectionId, title: values.title.trim(), tags: values.tags },
            {
              onSuccess: onCreated,
              onError: (error) => {
                // A taken number comes back as a conflict on the field.
                if (isApiError(error) && error.code === 'CONFLICT' && Object.keys(error.fields).length === 0) {
                  setFormError(error.message);
                  return;
                }
                setFormError(applyServerErrors(form, error, fields));
              },
            },
          );
        })}
      >
        <Stack gap="md">
          {formError && (
            <Text role="alert" c="redline.7" size="sm">
              {formError}
            </Text>
          )}
          <Group grow align="flex-start">
            <TextInput
              label="Document number"
              description="Letters, then hyphen-separated groups"
              placeholder="BW-STD-900"
              required
              data-autofocus
              autoComplete="off"
              spellCheck={false}
              {...form.getInputProps('documentNumber')}
              onChange={(event) => form.setFieldValue('documentNumber', event.currentTarget.value.toUpperCase())}
            />
            <Select
              label="Collection"
              description="Where the standard is filed"
              placeholder={collections.isLoading ? 'Loading…' : 'Pick a collection'}
              required
              allowDeselect={false}
              data={(collections.data?.items ?? []).map((collection) => ({ value: collection.id, label: collection.name }))}
              {...form.getInputProps('collectionId')}
              error={form.errors.collectionId ?? (collections.isError ? 'The collections could not be loaded' : undefined)}
            />
          </Group>
          <TextInput label="Title" placeholder="Minimum wall between cross-drilled ports and a bore" required {...form.getInputProps('title')} />
          <TagsInput
            label="Tags"
            description={`Up to ${maxPageTags}; press Enter after each`}
            placeholder="e.g. wall, ports, LMC"
            maxTags={maxPageTags}
            clearable
            {...form.getInputProps('tags')}
          />
          <Text size="sm" c="dimmed">
            The page starts as a draft only authors see. You write it next, then submit it for review.
          </Text>
          <Group justify="flex-end">
            <Button variant="default" onClick={onCancel}>
              Cancel
            </Button>
            <Button type="submit" loading={create.isPending}>
              Create and start writing
            </Button>
          </Group>
        </Stack>
      </form>
    </Paper>
  );
}
