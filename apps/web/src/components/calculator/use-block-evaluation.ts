import { useDebouncedValue } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import type { EvaluationResult } from '@limitbook/contracts';
import { isApiError } from '@/lib/api-client';
import { evaluationKey, evaluationQueryOptions, requestFromKey, type EvaluationRequest } from './api/evaluate';
import { deriveEvaluationView, type EvaluationView } from './lib/evaluation-state';

export type UseBlockEvaluationOptions = {
  /** False holds the evaluation back (e.g. until a page's batch has answered); the block shows `loading`. */
  enabled?: boolean;
  debounceMs?: number;
};

const unreachable = { statusCode: 0, code: 'INTERNAL' as const, message: 'The server could not evaluate this block. Try again in a moment.' };

/**
 * Evaluates a calculator block on the server whenever its request changes, debounced, and
 * says whether what it shows is current, being updated, or out of date after an error.
 * Answers are cached by request, so a page's batch (see `seedEvaluations`) or going back to
 * earlier inputs costs no round trip.
 */
export function useBlockEvaluation(request: EvaluationRequest, { enabled = true, debounceMs = 300 }: UseBlockEvaluationOptions = {}): EvaluationView & { retry: () => void } {
  const requestKey = evaluationKey(request);
  const [askedKey] = useDebouncedValue(requestKey, debounceMs);
  // The key is the request written out, so the debounced request is read back from it.
  const asked = useMemo(() => requestFromKey(askedKey), [askedKey]);

  const query = useQuery({ ...evaluationQueryOptions(asked), enabled });
  const [lastGood, setLastGood] = useState<{ key: string; result: EvaluationResult } | null>(null);
  const outcome = query.data;

  if (outcome?.ok && lastGood?.result !== outcome.result) setLastGood({ key: askedKey, result: outcome.result });

  const failure = query.error ? (isApiError(query.error) ? query.error.body : unreachable) : null;
  const view = useMemo(
    () =>
      deriveEvaluationView({
        requestKey,
        askedKey,
        running: !enabled || query.isFetching || (query.isPending && !query.isError),
        outcome,
        failure,
        lastGood: outcome?.ok && requestKey === askedKey ? { key: askedKey, result: outcome.result } : lastGood,
      }),
    [requestKey, askedKey, enabled, query.isFetching, query.isPending, query.isError, outcome, failure, lastGood],
  );
  return { ...view, retry: () => void query.refetch() };
}
