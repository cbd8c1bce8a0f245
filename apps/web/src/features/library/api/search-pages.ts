import { searchResponseSchema, type SearchResponse } from '@limitbook/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export type SearchParams = { q: string; collection?: string; tag?: string; limit?: number; offset?: number };

export function searchPages(params: SearchParams, { signal }: { signal?: AbortSignal } = {}): Promise<SearchResponse> {
  return api.get('/api/search', searchResponseSchema, { query: params, signal });
}

export const searchPagesQueryOptions = (params: SearchParams) =>
  queryOptions({
    queryKey: ['search', params],
    queryFn: ({ signal }) => searchPages(params, { signal }),
    enabled: params.q.trim().length > 0,
    placeholderData: keepPreviousData,
  });

export function useSearchPages(params: SearchParams) {
  return useQuery(searchPagesQueryOptions(params));
}
