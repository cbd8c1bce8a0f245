import { tagListSchema, type TagList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getTags({ signal }: { signal?: AbortSignal } = {}): Promise<TagList> {
  return api.get('/api/tags', tagListSchema, { signal });
}

export const getTagsQueryOptions = () => queryOptions({ queryKey: ['tags'], queryFn: ({ signal }) => getTags({ signal }) });

export function useTags() {
  return useQuery(getTagsQueryOptions());
}
