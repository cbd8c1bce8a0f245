import { methodDesignListSchema, type MethodDesignList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys } from './keys';

export function getMethodDesigns({ signal }: { signal?: AbortSignal } = {}): Promise<MethodDesignList> {
  return api.get('/api/method-designs', methodDesignListSchema, { signal });
}

export const getMethodDesignsQueryOptions = () => queryOptions({ queryKey: methodDesignKeys.list(), queryFn: ({ signal }) => getMethodDesigns({ signal }) });

/** In-house methods with their open revisions (for authors, reviewers and admins). */
export function useMethodDesigns() {
  return useQuery(getMethodDesignsQueryOptions());
}
