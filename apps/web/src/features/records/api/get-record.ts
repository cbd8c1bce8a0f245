import { calculationRecordSchema, type CalculationRecord } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getRecord(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<CalculationRecord> {
  return api.get(`/api/records/${encodeURIComponent(id)}`, calculationRecordSchema, { signal });
}

// A record never changes once saved.
export const getRecordQueryOptions = (id: string) => queryOptions({ queryKey: ['records', 'one', id], queryFn: ({ signal }) => getRecord(id, { signal }), staleTime: Infinity });

export function useRecord(id: string) {
  return useQuery(getRecordQueryOptions(id));
}
