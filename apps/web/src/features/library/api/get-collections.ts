import { collectionListSchema, type CollectionList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getCollections({ signal }: { signal?: AbortSignal } = {}): Promise<CollectionList> {
  return api.get('/api/collections', collectionListSchema, { signal });
}

export const getCollectionsQueryOptions = () => queryOptions({ queryKey: ['collections'], queryFn: ({ signal }) => getCollections({ signal }) });

export function useCollections() {
  return useQuery(getCollectionsQueryOptions());
}
