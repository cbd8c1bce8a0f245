import { auditListSchema, type AuditList } from '@limitbook/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The filters the page offers; paging is added per request. */
export type AuditFilters = { action?: string; from?: string; to?: string };
export type AuditPage = AuditFilters & { limit: number; offset: number };

export function getAuditEvents(query: AuditPage, { signal }: { signal?: AbortSignal } = {}): Promise<AuditList> {
  return api.get('/api/audit', auditListSchema, { query, signal });
}

export const getAuditEventsQueryOptions = (query: AuditPage) =>
  queryOptions({
    queryKey: ['audit', 'events', query],
    queryFn: ({ signal }) => getAuditEvents(query, { signal }),
  });

export function useAuditEvents(query: AuditPage) {
  return useQuery({ ...getAuditEventsQueryOptions(query), placeholderData: keepPreviousData });
}
