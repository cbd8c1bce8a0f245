import { notifications } from '@mantine/notifications';
import type { DesignDefinition, MethodRevision, SubmitForReviewRequest } from '@limitbook/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef, useState } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { isApiError } from '@/lib/api-client';
import { getMethodDraft } from '../api/get-method-draft';
import { methodDesignKeys } from '../api/keys';
import { submitMethodForReview, withdrawMethodFromReview } from '../api/method-review';
import { saveMethodDraft } from '../api/save-method-draft';
import { definitionKey, definitionProblems } from '../lib/definition';

export type MethodConflict = { message: string; latest: MethodRevision | null };

/**
 * Saving and submitting one in-house method's open revision. Every save names the version it
 * started from (`baseVersion`); a newer version on the server is never overwritten silently.
 */
export function useMethodDraftSession(slug: string, initial: MethodRevision) {
  const queryClient = useQueryClient();
  const [revision, setRevision] = useState(initial);
  const [baseVersion, setBaseVersion] = useState(initial.version);
  const [savedKey, setSavedKey] = useState(() => definitionKey(initial.definition));
  const [phase, setPhase] = useState<'idle' | 'saving' | 'submitting' | 'withdrawing'>('idle');
  const [conflict, setConflict] = useState<MethodConflict | null>(null);
  const [refused, setRefused] = useState<{ message: string; fields: Record<string, string> } | null>(null);
  const busy = useRef(false);

  const settle = (next: MethodRevision) => {
    setRevision(next);
    setBaseVersion(next.version);
    setSavedKey(definitionKey(next.definition));
    queryClient.setQueryData(methodDesignKeys.draft(slug), next);
    void queryClient.invalidateQueries({ queryKey: methodDesignKeys.list() });
  };

  const fail = useCallback(
    async (error: unknown, title: string) => {
      if (isApiError(error) && error.status === 409 && error.code === 'CONFLICT') {
        const latest = await getMethodDraft(slug).catch(() => null);
        setConflict({ message: error.message, latest });
      } else if (isApiError(error) && error.status === 400 && Object.keys(error.fields).length > 0) {
        setRefused({ message: error.message, fields: definitionProblems(error.fields) });
      } else {
        notifications.show({ color: 'redline', title, message: errorMessage(error) });
      }
    },
    [slug],
  );

  const save = useCallback(
    async (definition: DesignDefinition): Promise<boolean> => {
      if (busy.current || conflict) return false;
      busy.current = true;
      setPhase('saving');
      try {
        const saved = await saveMethodDraft(slug, { baseVersion, definition });
        settle(saved);
        setRefused(null);
        return true;
      } catch (error) {
        await fail(error, 'Not saved');
        return false;
      } finally {
        busy.current = false;
        setPhase('idle');
      }
    },
    // eslint-disable-next-line react-hooks/exhaustive-deps -- settle only writes state and cache
    [slug, baseVersion, conflict, fail],
  );

  const submit = useCallback(
    async (definition: DesignDefinition, request: SubmitForReviewRequest): Promise<MethodRevision | null> => {
      if (definitionKey(definition) !== savedKey && !(await save(definition))) return null;
      busy.current = true;
      setPhase('submitting');
      try {
        const submitted = await submitMethodForReview(slug, request);
        settle(submitted);
        setRefused(null);
        return submitted;
      } catch (error) {
        await fail(error, 'Not submitted');
        return null;
      } finally {
        busy.current = false;
        setPhase('idle');
      }
    },
    // eslint-disable-next-line react-hooks/exhaustive-deps -- settle only writes state and cache
    [slug, savedKey, save, fail],
  );

  const withdraw = useCallback(async () => {
    setPhase('withdrawing');
    try {
      settle(await withdrawMethodFromReview(slug));
      return true;
    } catch (error) {
      notifications.show({ color: 'redline', title: 'Not withdrawn', message: errorMessage(error) });
      return false;
    } finally {
      setPhase('idle');
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps -- settle only writes state and cache
  }, [slug]);

  /** Takes the server's newer version; the author's unsaved changes go. */
  const reloadLatest = useCallback(async (): Promise<MethodRevision | null> => {
    try {
      const latest = conflict?.latest ?? (await getMethodDraft(slug));
      settle(latest);
      setConflict(null);
      return latest;
    } catch (error) {
      notifications.show({ color: 'redline', title: 'Could not load the latest version', message: errorMessage(error) });
      return null;
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps -- settle only writes state and cache
  }, [slug, conflict]);

  /** Keeps the author's copy: the next save replaces the newer version. */
  const keepMine = useCallback(async () => {
    try {
      const latest = conflict?.latest ?? (await getMethodDraft(slug));
      setBaseVersion(latest.version);
      setConflict(null);
    } catch (error) {
      notifications.show({ color: 'redline', title: 'Could not read the latest version', message: errorMessage(error) });
    }
  }, [slug, conflict]);

  return { revision, baseVersion, savedKey, phase, conflict, refused, clearRefused: () => setRefused(null), save, submit, withdraw, reloadLatest, keepMine };
}
