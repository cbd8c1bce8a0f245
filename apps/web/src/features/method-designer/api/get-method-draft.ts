import { methodRevisionSchema, type MethodRevision } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

export function getMethodDraft(slug: string, { signal }: { signal?: AbortSignal } = {}): Promise<MethodRevision> {
  return api.get(`${methodDesignPath(slug)}/draft`, methodRevisionSchema, { signal });
}

export const getMethodDraftQueryOptions = (slug: string) =>
  queryOptions({
    queryKey: methodDesignKeys.draft(slug),
    queryFn: ({ signal }) => getMethodDraft(slug, { signal }),
    // The designer holds its own copy while open; a refetch must not pull the form from under the author.
    staleTime: Infinity,
  });

/** The open revision (draft or in review) of an in-house method. */
export function useMethodDraft(slug: string, enabled = true) {
  return useQuery({ ...getMethodDraftQueryOptions(slug), enabled });
}
