import { recordImpactListSchema, type RecordImpactList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getRecordImpact(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<RecordImpactList> {
  return api.get(`/api/records/${encodeURIComponent(id)}/impact`, recordImpactListSchema, { signal });
}

export const getRecordImpactQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['records', 'impact', id], queryFn: ({ signal }) => getRecordImpact(id, { signal }) });

export function useRecordImpact(id: string) {
  return useQuery(getRecordImpactQueryOptions(id));
}
