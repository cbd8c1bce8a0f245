import { Alert, Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { MethodRevision } from '@limitbook/contracts';
import { IconArrowBackUp, IconChecks, IconEye } from '@tabler/icons-react';
import { useState } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { useMethodReviewDecision } from '../api/method-review';

function decisionError(error: unknown): string {
  if (isApiError(error) && error.status === 403) return `${error.message} Someone who did not write or submit this revision has to review it.`;
  if (isApiError(error) && error.status === 409) return `${error.message} Reload to read the current version before deciding.`;
  return errorMessage(error);
}

/** Approve (releasing the next version) or send back the method revision in review. */
export function MethodReviewPanel({ slug, revision, onDecided }: { slug: string; revision: MethodRevision; onDecided: (kind: 'approve' | 'send-back', result: MethodRevision) => void }) {
  const decision = useMethodReviewDecision(slug);
  const [open, setOpen] = useState<'approve' | 'send-back' | null>(null);
  const [comment, setComment] = useState('');
  const [touched, setTouched] = useState(false);
  const { review } = revision;
  const missingComment = open === 'send-back' && comment.trim() === '';

  const close = () => {
    setOpen(null);
    setComment('');
    setTouched(false);
    decision.reset();
  };

  const decide = () => {
    setTouched(true);
    if (missingComment || !open) return;
    const trimmed = comment.trim();
    const request = open === 'approve' ? ({ kind: 'approve', body: { baseVersion: revision.version, ...(trimmed ? { comment: trimmed } : {}) } } as const) : ({ kind: 'send-back', body: { comment: trimmed } } as const);
    decision.mutate(request, {
      onSuccess: (result) => {
        close();
        notifications.show(
          request.kind === 'approve'
            ? { color: 'verdigris', title: `${result.definition.name} released`, message: `Version ${result.methodVersion ?? ''} is now the one calculators run.` }
            : { color: 'amber', title: `${result.definition.name} sent back`, message: 'The author has been told what to change.' },
        );
        onDecided(request.kind, result);
      },
    });
  };

  return (
    <>
      <Alert color="blue" title="Method revision in review" icon={<IconEye size={18} />}>
        <Stack gap="xs">
          <Text size="sm">
            {review.submittedBy ? `Submitted by ${review.submittedBy.name}` : 'Submitted'}
            {review.submittedAt ? ` on ${formatDateTime(review.submittedAt)}` : ''}
            {review.reviewers.length > 0 ? `; reviewers: ${review.reviewers.map((person) => person.name).join(', ')}` : ''}.
          </Text>
          {review.note && <Text size="sm">Note: {review.note}</Text>}
          <Group gap="xs">
            <Button size="xs" leftSection={<IconChecks size={16} />} onClick={() => setOpen('approve')}>
              Approve
            </Button>
            <Button size="xs" variant="default" leftSection={<IconArrowBackUp size={16} />} onClick={() => setOpen('send-back')}>
              Send back
            </Button>
          </Group>
        </Stack>
      </Alert>
      <Modal opened={open !== null} onClose={close} title={open === 'approve' ? `Approve “${revision.definition.name}”?` : `Send “${revision.definition.name}” back?`}>
        <Stack gap="md">
          <Text size="sm">
            {open === 'approve'
              ? 'Approving releases this definition as the next version. New calculator blocks pin it; pages pinned to older versions keep theirs until their authors move them forward.'
              : 'The revision goes back to draft and the author gets your comment by mail.'}
          </Text>
          {decision.isError && (
            <Alert color="redline" title={open === 'approve' ? 'Not approved' : 'Not sent back'} role="alert">
              {decisionError(decision.error)}
            </Alert>
          )}
          <Textarea
            label={open === 'approve' ? 'Comment (optional)' : 'What needs to change'}
            value={comment}
            onChange={(event) => setComment(event.currentTarget.value)}
            autosize
            minRows={3}
            maxLength={4000}
            required={open === 'send-back'}
            error={touched && missingComment ? 'Say what needs to change' : undefined}
          />
          <Group justify="flex-end">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button color={open === 'approve' ? undefined : 'amber'} onClick={decide} loading={decision.isPending}>
              {open === 'approve' ? 'Approve and release' : 'Send back'}
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}
