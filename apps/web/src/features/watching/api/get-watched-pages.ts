import { watchedPageListSchema, type WatchedPageList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getWatchedPages({ signal }: { signal?: AbortSignal } = {}): Promise<WatchedPageList> {
  return api.get('/api/watching', watchedPageListSchema, { signal });
}

export const getWatchedPagesQueryOptions = () => queryOptions({ queryKey: ['watching'], queryFn: ({ signal }) => getWatchedPages({ signal }) });

export function useWatchedPages() {
  return useQuery(getWatchedPagesQueryOptions());
}
