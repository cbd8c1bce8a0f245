import { revisionHistorySchema, type RevisionHistory } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getRevisions(pageId: string, { signal }: { signal?: AbortSignal } = {}): Promise<RevisionHistory> {
  return api.get(`/api/pages/${pageId}/revisions`, revisionHistorySchema, { signal });
}

export const getRevisionsQueryOptions = (pageId: string) =>
  queryOptions({ queryKey: ['revisions', pageId], queryFn: ({ signal }) => getRevisions(pageId, { signal }) });

export function useRevisions(pageId: string) {
  return useQuery(getRevisionsQueryOptions(pageId));
}
