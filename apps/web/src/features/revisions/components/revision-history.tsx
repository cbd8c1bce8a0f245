import { Alert, Anchor, Badge, Button, Checkbox, Group, Modal, Paper, Skeleton, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { Page, RevisionHistoryEntry } from '@limitbook/contracts';
import { IconArrowsDiff, IconRestore } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { errorMessage } from '@/components/form/server-errors';
import { PageHeader } from '@/components/layout/page-header';
import { paths } from '@/config/paths';
import { canAccess } from '@/lib/authorization';
import { formatDateTime } from '@/lib/format';
import { useSessionUser } from '@/lib/session';
import { useRevisions } from '../api/get-revisions';
import { useRestoreRevision } from '../api/restore-revision';
import { revisionName, stateColors, stateLabels } from '../lib/revision-name';
import classes from './revisions.module.css';

type Props = {
  page: Page;
  /** Extra lines under a release (its impact check), composed by the route. */
  renderReleaseExtra?: (entry: RevisionHistoryEntry) => ReactNode;
};

function RestoreModal({ page, entry, onClose }: { page: Page; entry: RevisionHistoryEntry | null; onClose: () => void }) {
  const navigate = useNavigate();
  const restore = useRestoreRevision(page.id);
  const close = () => {
    restore.reset();
    onClose();
  };
  return (
    <Modal opened={entry !== null} onClose={close} title={entry ? `Start a new draft from ${revisionName(entry)}?` : ''}>
      {entry && (
        <Stack gap="md">
          <Text size="sm">
            The text and calculator settings of {revisionName(entry)} become a new draft of {page.documentNumber}. The current release stays what readers see until the draft is reviewed
            and approved.
          </Text>
          {restore.isError && (
            <Alert color="redline" title="No draft started" role="alert">
              {errorMessage(restore.error)}
            </Alert>
          )}
          <Group justify="flex-end">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button
              leftSection={<IconRestore size={16} />}
              loading={restore.isPending}
              onClick={() =>
                restore.mutate(entry.id, {
                  onSuccess: (result) => {
                    notifications.show({ color: 'verdigris', title: 'Draft started', message: `${result.documentNumber} has a new draft from ${revisionName(entry)}.` });
                    close();
                    navigate(paths.standards.edit.getHref(result.documentNumber));
                  },
                })
              }
            >
              Start the draft
            </Button>
          </Group>
        </Stack>
      )}
    </Modal>
  );
}

function People({ entry }: { entry: RevisionHistoryEntry }) {
  const { review } = entry;
  const facts: [string, string][] = [
    ['Author', entry.createdBy?.name ?? '—'],
    ['Reviewers', review.reviewers.length > 0 ? review.reviewers.map((person) => person.name).join(', ') : '—'],
    ['Approved by', entry.approvedBy?.name ?? '—'],
    [entry.releasedAt ? 'Released' : 'Last saved', formatDateTime(entry.releasedAt ?? entry.updatedAt)],
  ];
  if (entry.supersededAt) facts.push(['Superseded', formatDateTime(entry.supersededAt)]);
  if (review.submittedAt) facts.push(['Submitted', `${formatDateTime(review.submittedAt)}${review.submittedBy ? ` by ${review.submittedBy.name}` : ''}`]);
  return (
    <dl className={classes.facts}>
      {facts.map(([label, value]) => (
        <div key={label}>
          <dt>{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Every revision of a page, newest first: who wrote, reviewed and approved it, when, and why; pick two to compare. */
export function RevisionHistory({ page, renderReleaseExtra }: Props) {
  const history = useRevisions(page.id);
  const role = useSessionUser().role;
  const editor = canAccess(role, 'standards.edit');
  const [picked, setPicked] = useState<string[]>([]);
  const [restoring, setRestoring] = useState<RevisionHistoryEntry | null>(null);

  const entries = history.data?.items ?? [];
  const toggle = (id: string) => setPicked((current) => (current.includes(id) ? current.filter((other) => other !== id) : [...current, id].slice(-2)));
  // Older first, so the comparison reads as "what changed since".
  const ordered = entries.filter((entry) => picked.includes(entry.id)).sort((a, b) => a.sequence - b.sequence);
  const openDraft = page.draft !== null;

  return (
    <Stack gap="lg" maw={960}>
      <PageHeader
        eyebrow={page.documentNumber}
        title="Revision history"
        description={page.revision.title}
        actions={
          <>
            <Button component={Link} to={paths.standards.page.getHref(page.documentNumber)} variant="default">
              Back to the standard
            </Button>
            <Button
              component={Link}
              to={ordered.length === 2 ? paths.standards.compare.getHref(page.documentNumber, ordered[0]!.id, ordered[1]!.id) : '#'}
              leftSection={<IconArrowsDiff size={16} />}
              disabled={ordered.length !== 2}
              aria-disabled={ordered.length !== 2}
              onClick={(event) => ordered.length !== 2 && event.preventDefault()}
            >
              Compare selected
            </Button>
          </>
        }
      />
      <Text size="sm" c="dimmed">
        Tick two revisions to compare their text and calculator settings.
      </Text>

      {history.isPending ? (
        <Skeleton h={320} />
      ) : history.isError ? (
        <PanelError error={history.error} onRetry={() => void history.refetch()} title="The history could not be loaded" />
      ) : (
        <ol className={classes.timeline} aria-label="Revisions">
          {entries.map((entry) => {
            const released = entry.state === 'released' || entry.state === 'superseded';
            const restoredFrom = entry.restoredFromId ? entries.find((other) => other.id === entry.restoredFromId) : undefined;
            return (
              <li key={entry.id} className={classes.entry} data-state={entry.state}>
                <Paper p="md" className={classes.card} data-revision={entry.revisionLetter ?? entry.state}>
                  <Group justify="space-between" align="flex-start" wrap="wrap" gap="sm">
                    <Group gap="sm" align="center">
                      <Checkbox
                        checked={picked.includes(entry.id)}
                        onChange={() => toggle(entry.id)}
                        aria-label={`Compare ${revisionName(entry)}`}
                      />
                      <Text className={classes.letter}>{entry.revisionLetter ? `Rev. ${entry.revisionLetter}` : `#${entry.sequence}`}</Text>
                      <Badge color={stateColors[entry.state]} variant={entry.state === 'released' ? 'filled' : 'light'} radius="xs" className={classes.state}>
                        {stateLabels[entry.state]}
                      </Badge>
                      <Text fw={600}>{entry.title}</Text>
                    </Group>
                    <Group gap="xs">
                      {editor && entry.state === 'draft' && (
                        <Button component={Link} to={paths.standards.edit.getHref(page.documentNumber)} size="xs" variant="light">
                          Open the draft
                        </Button>
                      )}
                      {entry.state === 'in_review' && (editor || canAccess(role, 'standards.review')) && (
                        <Button component={Link} to={`${paths.standards.page.getHref(page.documentNumber)}?view=draft`} size="xs" variant="light">
                          Open the revision in review
                        </Button>
                      )}
                      {role === 'admin' && released && (
                        <Button size="xs" variant="subtle" leftSection={<IconRestore size={14} />} onClick={() => setRestoring(entry)} disabled={openDraft} title={openDraft ? 'Finish or discard the open draft first' : undefined}>
                          Start a new draft from this revision
                        </Button>
                      )}
                    </Group>
                  </Group>
                  <People entry={entry} />
                  {entry.review.note && (
                    <Text size="sm" mt="xs" className={classes.note}>
                      <span className={classes.noteLabel}>Change note</span> {entry.review.note}
                    </Text>
                  )}
                  {entry.review.comment && (
                    <Text size="sm" mt="xs" className={classes.note}>
                      <span className={classes.noteLabel}>{released ? 'Approval comment' : 'Reviewer comment'}</span> {entry.review.comment}
                    </Text>
                  )}
                  {restoredFrom && (
                    <Text size="xs" c="dimmed" mt="xs">
                      Started from {revisionName(restoredFrom)}.
                    </Text>
                  )}
                  {released && renderReleaseExtra && <div className={classes.extra}>{renderReleaseExtra(entry)}</div>}
                </Paper>
              </li>
            );
          })}
        </ol>
      )}
      {role === 'admin' && openDraft && (
        <Text size="sm" c="dimmed">
          A draft is open: restoring an older revision waits until it is released or discarded.{' '}
          <Anchor component={Link} to={paths.standards.edit.getHref(page.documentNumber)}>
            Open the draft
          </Anchor>
        </Text>
      )}
      <RestoreModal page={page} entry={restoring} onClose={() => setRestoring(null)} />
    </Stack>
  );
}
