import { pageSchema, type Page } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * The page's draft for editing. A released page without a draft gets one started from its
 * published revision, so opening the editor is all an author has to do.
 */
export async function getEditableDraft(documentNumber: string): Promise<Page> {
  const ref = encodeURIComponent(documentNumber);
  const page = await api.get(`/api/pages/${ref}`, pageSchema);
  if (page.draft) return page.revision.state === 'draft' ? page : api.get(`/api/pages/${ref}`, pageSchema, { query: { view: 'draft' } });
  return api.post(`/api/pages/${page.id}/draft`, undefined, pageSchema);
}

/** The draft as it is on the server now, without starting one. */
export function getLatestDraft(pageId: string): Promise<Page> {
  return api.get(`/api/pages/${pageId}`, pageSchema, { query: { view: 'draft' } });
}

export const getEditableDraftQueryOptions = (documentNumber: string) =>
  queryOptions({
    queryKey: ['pages', documentNumber.toUpperCase(), 'draft'],
    queryFn: () => getEditableDraft(documentNumber),
    // The editor owns its copy from here; a background refetch must never replace it.
    staleTime: Infinity,
    gcTime: 0,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
  });

export function useEditableDraft(documentNumber: string, enabled = true) {
  return useQuery({ ...getEditableDraftQueryOptions(documentNumber), enabled });
}
