import { capturedMailSchema, type CapturedMail } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getMail(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<CapturedMail> {
  return api.get(`/api/mail/${encodeURIComponent(id)}`, capturedMailSchema, { signal });
}

export const getMailQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['mail', 'detail', id],
    queryFn: ({ signal }) => getMail(id, { signal }),
    // A captured message never changes.
    staleTime: Infinity,
  });

export function useMail(id: string) {
  return useQuery(getMailQueryOptions(id));
}
