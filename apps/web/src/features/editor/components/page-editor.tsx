import { Alert, Badge, Button, Group, Kbd, Modal, Stack, Text, TextInput } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { RichTextEditor } from '@mantine/tiptap';
import type { Page } from '@limitbook/contracts';
import { useEditor, type JSONContent } from '@tiptap/react';
import { IconArrowBackUp, IconDeviceFloppy, IconSend } from '@tabler/icons-react';
import { useEffect, useMemo, useState } from 'react';
import { Link, useBlocker } from 'react-router-dom';
import { formatRelative } from '../lib/format-time';
import { pageEditorExtensions } from '../lib/editor-extensions';
import { createFileUrls, FileUrlsContext } from '../hooks/use-file-urls';
import { useDraftSession } from '../hooks/use-draft-session';
import { useSaveShortcut } from '../hooks/use-save-shortcut';
import { ConflictModal } from './conflict-modal';
import { DocumentProblemsAlert } from './document-problems-alert';
import { EditorToolbar } from './editor-toolbar';
import { SubmitForReviewModal } from '@/components/review/submit-for-review-modal';
import classes from './page-editor.module.css';

type Props = {
  page: Page;
  /** Link back to the page as readers see it, when it has been published. */
  readerHref?: string;
};

export function PageEditor({ page, readerHref }: Props) {
  const fileUrls = useMemo(() => createFileUrls(page.fileUrls), [page.fileUrls]);
  const extensions = useMemo(() => pageEditorExtensions(), []);
  const editor = useEditor({
    extensions,
    content: page.revision.document as JSONContent,
    immediatelyRender: true,
    shouldRerenderOnTransaction: false,
    editorProps: { attributes: { 'aria-label': 'Page body', class: classes.prose ?? '' } },
  });
  const session = useDraftSession(editor, page, fileUrls);
  const { state, dirty } = session;
  const [asking, setAsking] = useState(false);

  useDocumentTitle(`${dirty ? '• ' : ''}Editing ${page.documentNumber} · Limitbook`);
  useSaveShortcut(() => void session.save());

  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const inReview = state.inReview;
  useEffect(() => {
    editor.setEditable(!inReview);
  }, [editor, inReview]);

  const submit = async (request: { reviewerIds: string[]; note?: string }) => {
    const submitted = await session.submit(request);
    if (!submitted) return;
    setAsking(false);
    notifications.show({ color: 'verdigris', title: `${submitted.documentNumber} is in review`, message: 'The reviewers have been asked by mail.' });
  };

  const busy = state.phase !== 'idle';
  const titleError = state.refused?.fields.title;

  return (
    <FileUrlsContext.Provider value={fileUrls}>
      <Stack gap={0} className={classes.shell}>
        <RichTextEditor editor={editor} className={classes.editor} variant="subtle" labels={{ tableInsertControlLabel: 'Insert table' }}>
          <div className={classes.stickyTop}>
            <div className={classes.actionBar}>
              <Group gap="xs" wrap="nowrap" className={classes.identity}>
                <Text className={classes.number}>{page.documentNumber}</Text>
                <Badge color={inReview ? 'blue' : 'amber'} variant="light">
                  {inReview ? 'In review' : 'Draft'} · v{state.baseVersion}
                </Badge>
                <Text size="sm" className={classes.status} role="status" aria-live="polite" data-dirty={dirty || undefined}>
                  {state.phase === 'saving'
                    ? 'Saving…'
                    : state.phase === 'submitting'
                      ? 'Submitting…'
                      : state.phase === 'withdrawing'
                        ? 'Withdrawing…'
                        : dirty
                        ? 'Unsaved changes'
                        : state.savedAt
                          ? `Saved ${formatRelative(state.savedAt)}`
                          : 'No changes'}
                </Text>
              </Group>
              <Group gap="xs" wrap="nowrap">
                {readerHref && (
                  <Button component={Link} to={readerHref} variant="subtle" size="sm">
                    View published
                  </Button>
                )}
                {inReview ? (
                  <Button size="sm" variant="default" leftSection={<IconArrowBackUp size={16} />} onClick={() => void session.withdraw()} loading={state.phase === 'withdrawing'} disabled={busy}>
                    Withdraw
                  </Button>
                ) : (
                  <>
                    <Button
                      variant="default"
                      size="sm"
                      leftSection={<IconDeviceFloppy size={16} />}
                      rightSection={
                        <Kbd size="xs" className={classes.kbd}>
                          Ctrl S
                        </Kbd>
                      }
                      onClick={() => void session.save()}
                      loading={state.phase === 'saving'}
                      disabled={busy || (!dirty && !state.overwriting)}
                    >
                      Save draft
                    </Button>
                    <Button size="sm" leftSection={<IconSend size={16} />} onClick={() => setAsking(true)} disabled={busy || !!state.conflict} loading={state.phase === 'submitting'}>
                      Submit for review
                    </Button>
                  </>
                )}
              </Group>
            </div>
            {!inReview && <EditorToolbar />}
          </div>

          <div className={classes.sheet}>
            {inReview && (
              <Alert color="blue" title="In review: read-only" mb="md">
                {inReview.submittedBy ? `${inReview.submittedBy.name} asked ` : 'Asked '}
                {inReview.reviewers.map((reviewer) => reviewer.name).join(', ') || 'the reviewers'} to review this revision
                {inReview.submittedAt ? ` ${formatRelative(inReview.submittedAt)}` : ''}. Withdraw it to make changes.
                {inReview.note && <Text size="sm" mt="xs">Note: {inReview.note}</Text>}
              </Alert>
            )}
            {state.overwriting && (
              <Alert color="amber" title="You are keeping your copy" mb="md">
                Saving replaces version {state.overwriting.version} (saved {formatRelative(state.overwriting.updatedAt)}) with what you see here.
              </Alert>
            )}
            {state.refused && <DocumentProblemsAlert editor={editor} refused={state.refused} />}
            <TextInput
              aria-label="Title"
              placeholder="Title of the standard"
              value={session.title}
              onChange={(event) => session.setTitle(event.currentTarget.value)}
              readOnly={!!inReview}
              error={titleError}
              maxLength={200}
              variant="unstyled"
              classNames={{ input: classes.titleInput }}
            />
            {/* In review, the calculator blocks' own fields are closed too, not just the text. */}
            <fieldset disabled={!!inReview} className={classes.lockable}>
              <RichTextEditor.Content className={classes.content} />
            </fieldset>
          </div>
        </RichTextEditor>
      </Stack>

      <ConflictModal
        conflict={state.conflict}
        onReload={() => void session.reloadLatest()}
        onKeepMine={() => void session.keepMine()}
      />

      <SubmitForReviewModal
        opened={asking}
        title={`Submit ${page.documentNumber} for review`}
        intro="The reviewers you pick get a mail. While the revision is in review nobody can edit it; withdraw it to make changes."
        noteHint="Optional: what changed, what to look at"
        dirty={dirty}
        submitting={state.phase === 'submitting' || state.phase === 'saving'}
        onClose={() => setAsking(false)}
        onSubmit={(request) => void submit(request)}
      />

      <Modal opened={blocker.state === 'blocked'} onClose={() => blocker.reset?.()} title="Leave without saving?">
        <Stack gap="md">
          <Text size="sm">Your changes to {page.documentNumber} are not saved. If you leave now, they are lost.</Text>
          <Group justify="flex-end">
            <Button variant="default" onClick={() => blocker.reset?.()}>
              Stay
            </Button>
            <Button color="redline" onClick={() => blocker.proceed?.()}>
              Leave and discard
            </Button>
          </Group>
        </Stack>
      </Modal>
    </FileUrlsContext.Provider>
  );
}
