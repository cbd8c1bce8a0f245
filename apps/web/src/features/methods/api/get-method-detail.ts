import { methodCatalogDetailSchema, type MethodCatalogDetail } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getMethodDetail(methodId: string, { signal }: { signal?: AbortSignal } = {}): Promise<MethodCatalogDetail> {
  return api.get(`/api/methods/${encodeURIComponent(methodId)}/usage`, methodCatalogDetailSchema, { signal });
}

export const getMethodDetailQueryOptions = (methodId: string) =>
  queryOptions({
    queryKey: ['methods', methodId, 'detail'],
    queryFn: ({ signal }) => getMethodDetail(methodId, { signal }),
  });

/** Where a method is used (pages and the version each pins) and, for in-house methods, the released test table. */
export function useMethodDetail(methodId: string) {
  return useQuery(getMethodDetailQueryOptions(methodId));
}
