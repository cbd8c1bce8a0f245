import { pageSchema, type ObsoleteRequest, type Page } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getPageQueryOptions } from './get-page';

export function obsoletePage(pageId: string, body: ObsoleteRequest): Promise<Page> {
  return api.post(`/api/pages/${pageId}/obsolete`, body, pageSchema);
}

export function reinstatePage(pageId: string): Promise<Page> {
  return api.post(`/api/pages/${pageId}/reinstate`, {}, pageSchema);
}

type Change = { kind: 'obsolete'; body: ObsoleteRequest } | { kind: 'reinstate' };

/** Marks a page obsolete or reinstates it (admins); the page's cached views show the banner at once. */
export function useObsoleteToggle(pageId: string, documentNumber: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: Change) => (change.kind === 'obsolete' ? obsoletePage(pageId, change.body) : reinstatePage(pageId)),
    onSuccess: (page) => {
      queryClient.setQueryData(getPageQueryOptions(documentNumber, 'released').queryKey, (current) => (current ? { ...current, obsolete: page.obsolete } : current));
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: getPageQueryOptions(documentNumber, 'released').queryKey }),
        queryClient.invalidateQueries({ queryKey: ['pages'] }),
      ]);
    },
  });
}
