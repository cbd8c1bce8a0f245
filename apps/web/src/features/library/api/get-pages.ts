import { pageListSchema, type PageList } from '@limitbook/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export type PagesQuery = { collection?: string; tag?: string; sort?: 'number' | 'recent'; limit?: number; offset?: number };

export function getPages(query: PagesQuery, { signal }: { signal?: AbortSignal } = {}): Promise<PageList> {
  return api.get('/api/pages', pageListSchema, { query, signal });
}

export const getPagesQueryOptions = (query: PagesQuery) =>
  queryOptions({ queryKey: ['pages', query], queryFn: ({ signal }) => getPages(query, { signal }), placeholderData: keepPreviousData });

export function usePages(query: PagesQuery) {
  return useQuery(getPagesQueryOptions(query));
}
