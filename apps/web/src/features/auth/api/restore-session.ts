import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** On load, trades the refresh cookie (if any) for an access token; `false` means signed out. */
export function restoreSession(): Promise<boolean> {
  return api.refreshSession();
}

export const restoreSessionQueryOptions = () =>
  queryOptions({
    queryKey: ['auth', 'restore'],
    queryFn: restoreSession,
    staleTime: Infinity,
    gcTime: Infinity,
    retry: false,
  });

export function useRestoreSession() {
  return useQuery(restoreSessionQueryOptions());
}
