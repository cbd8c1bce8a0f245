import { releaseImpactSchema, type ReleaseImpact } from '@limitbook/contracts';
import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getReleaseImpact(pageId: string, revisionId: string, { signal }: { signal?: AbortSignal } = {}): Promise<ReleaseImpact> {
  return api.get(`/api/pages/${pageId}/revisions/${revisionId}/impact`, releaseImpactSchema, { signal });
}

/** Polls at most this many times (2 s apart) while the check that the approval started is still running. */
export const impactPollLimit = 60;

export const getReleaseImpactQueryOptions = (pageId: string, revisionId: string) =>
  queryOptions({
    queryKey: ['impact', 'release', pageId, revisionId],
    queryFn: ({ signal }) => getReleaseImpact(pageId, revisionId, { signal }),
    refetchInterval: (query) => (query.state.data?.status === 'pending' && query.state.dataUpdateCount < impactPollLimit ? 2000 : false),
  });

/** The release's impact check; `gaveUp` once polling stopped with the check still pending. */
export function useReleaseImpact(pageId: string, revisionId: string) {
  const options = getReleaseImpactQueryOptions(pageId, revisionId);
  const query = useQuery(options);
  const polls = useQueryClient().getQueryState(options.queryKey)?.dataUpdateCount ?? 0;
  return { query, gaveUp: query.data?.status === 'pending' && polls >= impactPollLimit };
}
