import { Alert, Anchor, Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { Page } from '@limitbook/contracts';
import { IconArrowBackUp, IconChecks, IconEye } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { errorMessage } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { useReviewDecision } from '../api/review-decision';

/** Shown over the released text when the page also has a revision waiting for review. */
export function ReviewWaitingBanner({ documentNumber }: { documentNumber: string }) {
  return (
    <Alert color="blue" title="Review" icon={<IconEye size={18} />} mb="md" role="note">
      <Group justify="space-between" gap="sm">
        <Text size="sm">A new revision of this standard is waiting for review.</Text>
        <Anchor component={Link} to={`${paths.standards.page.getHref(documentNumber)}?view=draft`} size="sm" fw={600}>
          Open the revision in review
        </Anchor>
      </Group>
    </Alert>
  );
}

function decisionError(error: unknown): string {
  if (isApiError(error) && error.status === 403) return `${error.message} Someone who did not create, edit or submit this revision has to review it.`;
  if (isApiError(error) && error.status === 409) return `${error.message} Reload the page to read the current version before deciding.`;
  return errorMessage(error);
}

/** Approve or send back the revision in review, for reviewers and admins. */
export function ReviewPanel({ page }: { page: Page }) {
  const navigate = useNavigate();
  const decision = useReviewDecision(page.id, page.documentNumber);
  const [open, setOpen] = useState<'approve' | 'send-back' | null>(null);
  const [comment, setComment] = useState('');
  const [touched, setTouched] = useState(false);
  const { review } = page.revision;
  const missingComment = open === 'send-back' && comment.trim() === '';

  const close = () => {
    setOpen(null);
    setComment('');
    setTouched(false);
    decision.reset();
  };

  const decide = () => {
    setTouched(true);
    if (missingComment) return;
    const trimmed = comment.trim();
    const request =
      open === 'approve'
        ? ({ kind: 'approve', body: { baseVersion: page.revision.version, ...(trimmed ? { comment: trimmed } : {}) } } as const)
        : ({ kind: 'send-back', body: { comment: trimmed } } as const);
    decision.mutate(request, {
      onSuccess: (result) => {
        close();
        if (request.kind === 'approve') {
          notifications.show({ color: 'verdigris', title: `${result.documentNumber} released`, message: `Revision ${result.revision.revisionLetter ?? ''} is now the one readers see.` });
        } else {
          notifications.show({ color: 'amber', title: `${result.documentNumber} sent back`, message: 'The author has been told what to change.' });
        }
        navigate(paths.standards.page.getHref(result.documentNumber));
      },
    });
  };

  return (
    <>
      <Alert color="blue" title="Revision in review" icon={<IconEye size={18} />} mb="md">
        <Stack gap="xs">
          <Text size="sm">
            {review.submittedBy ? `Submitted by ${review.submittedBy.name}` : 'Submitted'}
            {review.submittedAt ? ` on ${formatDateTime(review.submittedAt)}` : ''}
            {review.reviewers.length > 0 ? `; reviewers: ${review.reviewers.map((reviewer) => reviewer.name).join(', ')}` : ''}. Version {page.revision.version}.
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

      <Modal opened={open !== null} onClose={close} title={open === 'approve' ? `Approve ${page.documentNumber}?` : `Send ${page.documentNumber} back?`}>
        <Stack gap="md">
          <Text size="sm">
            {open === 'approve'
              ? 'Approving releases this revision with the next revision letter; it replaces the current release for every reader.'
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
