import { laggingBlocksSchema, type LaggingBlocks } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Calculator blocks of a page pinned to an older release of their method (the open draft's blocks for editors). */
export function getLaggingBlocks(pageId: string, { signal }: { signal?: AbortSignal } = {}): Promise<LaggingBlocks> {
  return api.get(`/api/pages/${pageId}/lagging-blocks`, laggingBlocksSchema, { signal });
}

export const getLaggingBlocksQueryOptions = (pageId: string) =>
  queryOptions({ queryKey: ['page-lagging-blocks', pageId], queryFn: ({ signal }) => getLaggingBlocks(pageId, { signal }) });

export function useLaggingBlocks(pageId: string, { enabled }: { enabled: boolean }) {
  return useQuery({ ...getLaggingBlocksQueryOptions(pageId), enabled });
}
