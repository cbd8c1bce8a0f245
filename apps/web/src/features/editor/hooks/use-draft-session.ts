import { notifications } from '@mantine/notifications';
import type { Page, SubmitForReviewRequest } from '@limitbook/contracts';
import type { Editor, JSONContent } from '@tiptap/react';
import { useCallback, useEffect, useLayoutEffect, useReducer, useRef, useState } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { isApiError } from '@/lib/api-client';
import { getLatestDraft } from '../api/get-draft';
import { submitForReview, withdrawFromReview } from '../api/review';
import { saveDraft } from '../api/save-draft';
import { draftReducer, initialDraftState, isDirty, type DraftSnapshot } from '../lib/draft-session';
import type { FileUrls } from './use-file-urls';

function snapshotOf(editor: Editor, title: string): DraftSnapshot {
  return { title, document: JSON.stringify(editor.getJSON()) };
}

function rememberFileUrls(fileUrls: FileUrls, page: Page) {
  for (const [fileId, url] of Object.entries(page.fileUrls)) fileUrls.set(fileId, url);
}

/**
 * Saving, submitting for review and optimistic locking for one page's draft: every save names the
 * version it started from, and a newer version on the server is never overwritten silently.
 */
export function useDraftSession(editor: Editor, page: Page, fileUrls: FileUrls) {
  const [title, setTitle] = useState(page.revision.title);
  const [state, dispatch] = useReducer(draftReducer, undefined, () => initialDraftState(page, snapshotOf(editor, page.revision.title)));
  const [documentText, setDocumentText] = useState(() => JSON.stringify(editor.getJSON()));
  const stateRef = useRef(state);
  const titleRef = useRef(title);
  useLayoutEffect(() => {
    stateRef.current = state;
    titleRef.current = title;
  }, [state, title]);

  useEffect(() => {
    const onUpdate = () => setDocumentText(JSON.stringify(editor.getJSON()));
    editor.on('update', onUpdate);
    return () => {
      editor.off('update', onUpdate);
    };
  }, [editor]);

  const dirty = isDirty(state, { title, document: documentText });

  const handleFailure = useCallback(
    async (error: unknown) => {
      if (isApiError(error) && error.status === 409 && error.code === 'CONFLICT') {
        const latest = await getLatestDraft(stateRef.current.pageId).catch(() => null);
        dispatch({ type: 'conflict', message: error.message, latest });
      } else if (isApiError(error) && error.status === 400 && Object.keys(error.fields).length > 0) {
        dispatch({ type: 'refused', message: error.message, fields: error.fields });
      } else {
        notifications.show({ color: 'redline', title: 'Not saved', message: errorMessage(error) });
        dispatch({ type: 'settled' });
      }
    },
    [],
  );

  /** Saves the draft; resolves to whether the server took it. */
  const save = useCallback(async (): Promise<boolean> => {
    if (stateRef.current.phase !== 'idle' || stateRef.current.conflict || stateRef.current.inReview) return false;
    const snapshot = snapshotOf(editor, titleRef.current);
    dispatch({ type: 'save-started' });
    try {
      const saved = await saveDraft(stateRef.current.pageId, {
        baseVersion: stateRef.current.baseVersion,
        title: snapshot.title.trim(),
        document: JSON.parse(snapshot.document) as { type: 'doc' },
      });
      rememberFileUrls(fileUrls, saved);
      dispatch({ type: 'saved', page: saved, snapshot });
      return true;
    } catch (error) {
      await handleFailure(error);
      return false;
    }
  }, [editor, fileUrls, handleFailure]);

  /** Saves what is unsaved, then submits that version for review. Resolves to the page in review, or null. */
  const submit = useCallback(
    async (request: SubmitForReviewRequest): Promise<Page | null> => {
      if (isDirty(stateRef.current, snapshotOf(editor, titleRef.current)) && !(await save())) return null;
      dispatch({ type: 'submit-started' });
      try {
        const submitted = await submitForReview(stateRef.current.pageId, request);
        dispatch({ type: 'submitted', page: submitted });
        return submitted;
      } catch (error) {
        await handleFailure(error);
        return null;
      }
    },
    [editor, save, handleFailure],
  );

  /** Takes the revision back out of review so it can be edited again. */
  const withdraw = useCallback(async (): Promise<boolean> => {
    if (stateRef.current.phase !== 'idle' || !stateRef.current.inReview) return false;
    dispatch({ type: 'withdraw-started' });
    try {
      const withdrawn = await withdrawFromReview(stateRef.current.pageId);
      dispatch({ type: 'withdrawn', page: withdrawn });
      return true;
    } catch (error) {
      notifications.show({ color: 'redline', title: 'Not withdrawn', message: errorMessage(error) });
      dispatch({ type: 'settled' });
      return false;
    }
  }, []);

  /** Drops the local copy for the version on the server. */
  const reloadLatest = useCallback(async () => {
    try {
      const latest = await getLatestDraft(stateRef.current.pageId);
      rememberFileUrls(fileUrls, latest);
      editor.commands.setContent(latest.revision.document as JSONContent, { emitUpdate: true });
      setTitle(latest.revision.title);
      dispatch({ type: 'reloaded', latest, snapshot: snapshotOf(editor, latest.revision.title) });
    } catch (error) {
      notifications.show({ color: 'redline', title: 'Could not load the latest version', message: errorMessage(error) });
    }
  }, [editor, fileUrls]);

  /** Keeps the local copy; the next save replaces the newer version on the server. */
  const keepMine = useCallback(async () => {
    try {
      const latest = stateRef.current.conflict?.latest ?? (await getLatestDraft(stateRef.current.pageId));
      dispatch({ type: 'kept-mine', latest });
    } catch (error) {
      notifications.show({ color: 'redline', title: 'Could not read the latest version', message: errorMessage(error) });
    }
  }, []);

  return { state, title, setTitle, dirty, save, submit, withdraw, reloadLatest, keepMine };
}
