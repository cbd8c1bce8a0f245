import { watchStatusSchema, type WatchStatus } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getWatchedPagesQueryOptions } from './get-watched-pages';

export async function setWatching(pageId: string, watching: boolean): Promise<WatchStatus> {
  if (watching) return api.post(`/api/pages/${pageId}/watch`, {}, watchStatusSchema);
  await api.send(`/api/pages/${pageId}/watch`, { method: 'DELETE' });
  return { pageId, watching: false };
}

/** Watches or stops watching a page; the watched list refreshes. */
export function useWatchPage(pageId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (watching: boolean) => setWatching(pageId, watching),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getWatchedPagesQueryOptions().queryKey }),
  });
}
