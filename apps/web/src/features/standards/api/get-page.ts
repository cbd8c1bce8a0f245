import { pageSchema, type Page } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Which revision to show: the released one (default) or the open one (`draft`, for those who may see it). */
export type PageView = 'released' | 'draft';

/** A page by id or document number, as readers see it (the published revision), or its open revision. */
export function getPage(ref: string, { signal, view = 'released' }: { signal?: AbortSignal; view?: PageView } = {}): Promise<Page> {
  return api.get(`/api/pages/${encodeURIComponent(ref)}`, pageSchema, { signal, ...(view === 'draft' ? { query: { view: 'draft' } } : {}) });
}

export const getPageQueryOptions = (ref: string, view: PageView = 'released') =>
  queryOptions({
    queryKey: ['page', ref.toUpperCase(), view],
    queryFn: ({ signal }) => getPage(ref, { signal, view }),
    // Signed file addresses last an hour; a fresh page brings fresh ones.
    staleTime: 5 * 60_000,
  });

export function usePage(ref: string, view: PageView = 'released') {
  return useQuery(getPageQueryOptions(ref, view));
}
