import { revisionCompareSchema, type RevisionCompare } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function compareRevisions(pageId: string, from: string, to: string, { signal }: { signal?: AbortSignal } = {}): Promise<RevisionCompare> {
  return api.get(`/api/pages/${pageId}/compare`, revisionCompareSchema, { query: { from, to }, signal });
}

export const compareRevisionsQueryOptions = (pageId: string, from: string, to: string) =>
  queryOptions({
    queryKey: ['revisions', pageId, 'compare', from, to],
    queryFn: ({ signal }) => compareRevisions(pageId, from, to, { signal }),
    // Released revisions never change; a draft side may, so it is asked again after a minute.
    staleTime: 60_000,
  });

export function useRevisionCompare(pageId: string, from: string | null, to: string | null) {
  return useQuery({ ...compareRevisionsQueryOptions(pageId, from ?? '', to ?? ''), enabled: !!from && !!to && from !== to });
}
