import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { isApiError } from './api-client';

export const queryConfig = {
  queries: {
    staleTime: 30_000,
    refetchOnWindowFocus: false,
    // A 4xx will not change by asking again; network trouble and 5xx get two more tries.
    retry: (failureCount, error) => {
      if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
      return failureCount < 2;
    },
  },
  mutations: { retry: false },
} satisfies DefaultOptions;

export function createQueryClient() {
  return new QueryClient({ defaultOptions: queryConfig });
}

export const queryClient = createQueryClient();
