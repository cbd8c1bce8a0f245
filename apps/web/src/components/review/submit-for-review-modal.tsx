import { Alert, Button, Group, Modal, MultiSelect, Stack, Text, Textarea } from '@mantine/core';
import type { SubmitForReviewRequest } from '@limitbook/contracts';
import { useState, type ReactNode } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { useSessionUser } from '@/lib/session';
import { useReviewers } from './api/get-reviewers';

type Props = {
  opened: boolean;
  title: string;
  /** What happens on submission, in the words of the thing being reviewed. */
  intro: ReactNode;
  noteHint: string;
  dirty: boolean;
  submitting: boolean;
  onClose: () => void;
  onSubmit: (request: SubmitForReviewRequest) => void;
};

/** Asks who should review a page revision or a method version, with an optional note for them. */
export function SubmitForReviewModal({ opened, title, intro, noteHint, dirty, submitting, onClose, onSubmit }: Props) {
  const me = useSessionUser();
  const reviewers = useReviewers(opened);
  const [reviewerIds, setReviewerIds] = useState<string[]>([]);
  const [note, setNote] = useState('');
  const [touched, setTouched] = useState(false);

  // Nobody reviews their own work, so the author is not offered.
  const options = (reviewers.data?.items ?? [])
    .filter((reviewer) => reviewer.id !== me.id)
    .map((reviewer) => ({ value: reviewer.id, label: `${reviewer.name} (${reviewer.email})` }));
  const missing = reviewerIds.length === 0;

  const submit = () => {
    setTouched(true);
    if (missing) return;
    const trimmed = note.trim();
    onSubmit({ reviewerIds, ...(trimmed ? { note: trimmed } : {}) });
  };

  return (
    <Modal opened={opened} onClose={onClose} title={title}>
      <Stack gap="md">
        <Text size="sm">
          {intro}
          {dirty && ' Your unsaved changes are saved first.'}
        </Text>
        {reviewers.isError && (
          <Alert color="redline" title="Reviewers could not be loaded">
            {errorMessage(reviewers.error)}
          </Alert>
        )}
        <MultiSelect
          label="Reviewers"
          placeholder={options.length ? 'Pick one or more' : undefined}
          data={options}
          value={reviewerIds}
          onChange={setReviewerIds}
          searchable
          nothingFoundMessage="Nobody matches"
          disabled={reviewers.isPending}
          error={touched && missing ? 'Pick at least one reviewer' : undefined}
          comboboxProps={{ withinPortal: true }}
          required
        />
        <Textarea label="Note for the reviewers" description={noteHint} value={note} onChange={(event) => setNote(event.currentTarget.value)} autosize minRows={2} maxLength={4000} />
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Keep editing
          </Button>
          <Button onClick={submit} loading={submitting}>
            Submit for review
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
