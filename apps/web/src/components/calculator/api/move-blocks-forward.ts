import { moveBlocksForwardResponseSchema, pageSchema, type MoveBlocksForwardResponse } from '@limitbook/contracts';
import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';

/**
 * Pins blocks of a page to their method's latest release, in the page's draft (the server starts
 * one from the release when there is none). With a draft open the server wants its version, which
 * is read and sent on the one retry; the change then goes through the page's review like any other.
 */
export async function moveBlocksForward(pageId: string, blockIds: string[]): Promise<MoveBlocksForwardResponse> {
  const path = `/api/pages/${pageId}/lagging-blocks/move-forward`;
  try {
    return await api.post(path, { blockIds }, moveBlocksForwardResponseSchema);
  } catch (error) {
    if (!(isApiError(error) && error.status === 409 && 'baseVersion' in error.fields)) throw error;
    const draft = await api.get(`/api/pages/${pageId}`, pageSchema, { query: { view: 'draft' } });
    return api.post(path, { blockIds, baseVersion: draft.revision.version }, moveBlocksForwardResponseSchema);
  }
}

/**
 * Shared by the method page (blocks across pages) and the standard page (blocks of one page);
 * each names the queries that show pins, refreshed once the move is saved.
 */
export function useMoveBlocksForward(staleQueryKeys: QueryKey[]) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ pageId, blockIds }: { pageId: string; blockIds: string[] }) => moveBlocksForward(pageId, blockIds),
    onSuccess: () => Promise.all(staleQueryKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
