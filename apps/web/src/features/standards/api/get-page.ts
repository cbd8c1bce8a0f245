import { pageSchema, type Page } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** A page by id or document number, as readers see it (the published revision). */
export function getPage(ref: string, { signal }: { signal?: AbortSignal } = {}): Promise<Page> {
  return api.get(`/api/pages/${encodeURIComponent(ref)}`, pageSchema, { signal });
}

export const getPageQueryOptions = (ref: string) =>
  queryOptions({
    queryKey: ['page', ref.toUpperCase()],
    queryFn: ({ signal }) => getPage(ref, { signal }),
    // Signed file addresses last an hour; a fresh page brings fresh ones.
    staleTime: 5 * 60_000,
  });

export function usePage(ref: string) {
  return useQuery(getPageQueryOptions(ref));
}
