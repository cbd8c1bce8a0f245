import { recordListSchema, type RecordList } from '@limitbook/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The filters "My records" offers; paging is added per request. */
export type RecordFilters = {
  documentNumber?: string;
  method?: string;
  verdict?: 'pass' | 'fail' | 'none';
  reference?: string;
  from?: string;
  to?: string;
};
export type RecordsPage = RecordFilters & { limit: number; offset: number };

export function getRecords(query: RecordsPage, { signal }: { signal?: AbortSignal } = {}): Promise<RecordList> {
  return api.get('/api/records', recordListSchema, { query, signal });
}

export const getRecordsQueryOptions = (query: RecordsPage) =>
  queryOptions({ queryKey: ['records', 'list', query], queryFn: ({ signal }) => getRecords(query, { signal }) });

export function useRecords(query: RecordsPage) {
  return useQuery({ ...getRecordsQueryOptions(query), placeholderData: keepPreviousData });
}
