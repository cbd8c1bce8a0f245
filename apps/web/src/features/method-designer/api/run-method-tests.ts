import { testRunSchema } from '@limitbook/contracts';
import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignPath } from './keys';

/** Runs the saved open version's test table on the server. */
export function runMethodTests(slug: string) {
  return api.post(`${methodDesignPath(slug)}/draft/run-tests`, undefined, testRunSchema);
}

/** The run as a query for a revision that cannot change under it (the one in review). */
export const runMethodTestsQueryOptions = (slug: string, revisionId: string, version: number) =>
  queryOptions({ queryKey: ['method-test-run', slug, revisionId, version], queryFn: () => runMethodTests(slug), staleTime: Infinity });
