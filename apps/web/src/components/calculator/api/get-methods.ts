import { methodCatalogSchema, type MethodCatalog, type MethodSummary } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getMethods({ signal }: { signal?: AbortSignal } = {}): Promise<MethodCatalog> {
  return api.get('/api/methods', methodCatalogSchema, { signal });
}

export const getMethodsQueryOptions = () =>
  queryOptions({
    queryKey: ['methods'],
    queryFn: ({ signal }) => getMethods({ signal }),
    // The catalog changes only when a method is released.
    staleTime: 10 * 60_000,
  });

/** The method catalog, and a lookup by id. */
export function useMethods() {
  const query = useQuery(getMethodsQueryOptions());
  const byId = (id: string): MethodSummary | undefined => query.data?.items.find((method) => method.id === id);
  return { ...query, byId };
}
