import { pageSchema, type Page } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getRevisionsQueryOptions } from './get-revisions';

export function restoreRevision(pageId: string, revisionId: string): Promise<Page> {
  return api.post(`/api/pages/${pageId}/revisions/${revisionId}/restore`, {}, pageSchema);
}

/** Starts a new draft from an older revision (admins); the history then lists the draft. */
export function useRestoreRevision(pageId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (revisionId: string) => restoreRevision(pageId, revisionId),
    onSuccess: (page) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getRevisionsQueryOptions(pageId).queryKey }),
        // The page's own views now have an open draft.
        queryClient.invalidateQueries({ queryKey: ['page', page.documentNumber.toUpperCase()] }),
        queryClient.invalidateQueries({ queryKey: ['pages', page.documentNumber.toUpperCase()] }),
      ]),
  });
}
