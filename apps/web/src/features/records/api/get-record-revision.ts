import { pageRevisionSchema, type PageRevision } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The page revision a record was made under (released revisions never change). */
export function getRecordRevision(pageId: string, revisionId: string, { signal }: { signal?: AbortSignal } = {}): Promise<PageRevision> {
  return api.get(`/api/pages/${pageId}/revisions/${revisionId}`, pageRevisionSchema, { signal });
}

export const getRecordRevisionQueryOptions = (pageId: string, revisionId: string) =>
  queryOptions({ queryKey: ['records', 'revision', pageId, revisionId], queryFn: ({ signal }) => getRecordRevision(pageId, revisionId, { signal }), staleTime: Infinity });

export function useRecordRevision(pageId: string | undefined, revisionId: string | undefined) {
  return useQuery({ ...getRecordRevisionQueryOptions(pageId ?? '', revisionId ?? ''), enabled: !!pageId && !!revisionId });
}
