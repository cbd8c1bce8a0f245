import { Alert, Anchor, Button, Group, Modal, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import type { LengthUnit } from '@limitbook/contracts';
import { IconDeviceFloppy } from '@tabler/icons-react';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { useCreateRecord } from '../api/create-record';

export type SaveRecordTarget = {
  pageId: string;
  revisionId: string;
  documentNumber: string;
  revisionLetter: string | null;
  blockId: string;
  caption: string;
};

type Props = SaveRecordTarget & {
  inputs: Record<string, unknown>;
  unit: LengthUnit;
  /** Whether the block shows a current result for these inputs (saving waits for it). */
  evaluated: boolean;
};

const referenceFields = ['reference.partNumber', 'reference.drawing', 'reference.note'] as const;

/** "Save record…" beside a calculator block's result: the reader's reference, then the server evaluates and stores the run. */
export function SaveRecordButton({ inputs, unit, evaluated, ...target }: Props) {
  const navigate = useNavigate();
  const [opened, setOpened] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreateRecord();
  const form = useForm({
    mode: 'controlled',
    initialValues: { reference: { partNumber: '', drawing: '', note: '' } },
  });

  const close = () => {
    setOpened(false);
    setProblem(null);
    create.reset();
  };

  const submit = form.onSubmit((values) => {
    setProblem(null);
    const reference = Object.fromEntries(Object.entries(values.reference).map(([key, value]) => [key, value.trim()]).filter(([, value]) => value !== ''));
    create.mutate(
      { pageId: target.pageId, revisionId: target.revisionId, blockId: target.blockId, inputs, unit, reference },
      {
        onSuccess: (record) => {
          close();
          form.reset();
          const href = paths.records.record.getHref(record.id);
          notifications.show({
            color: 'verdigris',
            title: 'Record saved',
            message: (
              <Text size="sm">
                {record.verdict ? (record.verdict.pass ? 'Passes' : 'Fails') : 'No verdict'} under {target.documentNumber}
                {target.revisionLetter ? ` Rev. ${target.revisionLetter}` : ''}.{' '}
                <Anchor component="button" type="button" size="sm" fw={600} onClick={() => navigate(href)}>
                  Open the record
                </Anchor>
              </Text>
            ),
          });
        },
        onError: (error) => setProblem(applyServerErrors(form, error, referenceFields)),
      },
    );
  });

  return (
    <>
      <Button size="compact-sm" variant="light" leftSection={<IconDeviceFloppy size={14} />} onClick={() => setOpened(true)} disabled={!evaluated}>
        Save record…
      </Button>
      <Modal opened={opened} onClose={close} title="Save a calculation record">
        <form onSubmit={submit} noValidate>
          <Stack gap="md">
            <Text size="sm">
              The server runs <strong>{target.caption}</strong> again with your inputs ({unit}) and the rule of {target.documentNumber}
              {target.revisionLetter ? ` Rev. ${target.revisionLetter}` : ''}, and keeps the result with a permalink. Say what it is for, to find it again.
            </Text>
            {problem && (
              <Alert color="redline" title="The record was not saved" role="alert">
                {problem}
              </Alert>
            )}
            <Group grow align="flex-start">
              <TextInput label="Part number" maxLength={100} {...form.getInputProps('reference.partNumber')} />
              <TextInput label="Drawing" maxLength={100} {...form.getInputProps('reference.drawing')} />
            </Group>
            <Textarea label="Note" rows={3} maxLength={2000} {...form.getInputProps('reference.note')} />
            <Group justify="flex-end">
              <Button variant="default" onClick={close}>
                Cancel
              </Button>
              <Button type="submit" loading={create.isPending} leftSection={<IconDeviceFloppy size={16} />}>
                Save record
              </Button>
            </Group>
          </Stack>
        </form>
      </Modal>
    </>
  );
}
