import { collectionListSchema } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getCollections() {
  return api.get('/api/collections', collectionListSchema);
}

export const getCollectionsQueryOptions = () => queryOptions({ queryKey: ['collections'], queryFn: getCollections });

export function useCollections() {
  return useQuery(getCollectionsQueryOptions());
}
