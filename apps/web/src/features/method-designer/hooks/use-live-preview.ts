import { useDebouncedValue } from '@mantine/hooks';
import type { DesignDefinition } from '@limitbook/contracts';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { previewMethodQueryOptions, type PreviewOutcome } from '../api/preview-method';
import { definitionKey, definitionProblems } from '../lib/definition';

/**
 * Asks the server to evaluate the definition on screen with its defaults, ~300 ms after the
 * author stops typing. A newer definition cancels the request for an older one. What comes back
 * is the result, the TeX of each expression, and the messages per field when it is refused.
 */
export function useLivePreview(definition: DesignDefinition, { enabled = true, debounceMs = 300 }: { enabled?: boolean; debounceMs?: number } = {}) {
  const key = definitionKey(definition);
  const [askedKey] = useDebouncedValue(key, debounceMs);
  const asked = useMemo(() => JSON.parse(askedKey) as DesignDefinition, [askedKey]);
  const canAsk = enabled && asked.name.trim() !== '' && asked.outputs.length > 0;
  const query = useQuery({ ...previewMethodQueryOptions(asked, askedKey), enabled: canAsk });
  const outcome: PreviewOutcome | undefined = canAsk ? query.data : undefined;

  // A refused preview carries TeX only for what parsed; the rest keeps its last typeset form.
  const [typeset, setTypeset] = useState<{ outcome: PreviewOutcome | undefined; tex: Record<string, string> }>({ outcome: undefined, tex: {} });
  if (outcome && typeset.outcome !== outcome) setTypeset({ outcome, tex: outcome.ok ? outcome.response.tex : { ...typeset.tex, ...outcome.tex } });
  const tex = typeset.tex;

  const problems = useMemo(() => (outcome && !outcome.ok ? definitionProblems(outcome.fields) : {}), [outcome]);
  return {
    outcome,
    tex,
    problems,
    /** The author has typed since the result on screen was asked for, or it is on its way. */
    updating: canAsk && (key !== askedKey || query.isFetching),
    waitingFor: !canAsk ? (asked.name.trim() === '' ? 'a name' : 'an output') : null,
    failure: query.error,
  };
}
