import { capturedMailListSchema, type CapturedMailList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getMails({ signal }: { signal?: AbortSignal } = {}): Promise<CapturedMailList> {
  return api.get('/api/mail', capturedMailListSchema, { signal });
}

export const getMailsQueryOptions = () =>
  queryOptions({
    queryKey: ['mail', 'list'],
    queryFn: ({ signal }) => getMails({ signal }),
  });

/** Captured mail arrives while the page is open (an invite just sent), so the list polls gently. */
export function useMails() {
  return useQuery({ ...getMailsQueryOptions(), refetchInterval: 10_000 });
}
