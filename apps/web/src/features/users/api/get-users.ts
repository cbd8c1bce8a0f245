import { userListSchema, type UserList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getUsers({ signal }: { signal?: AbortSignal } = {}): Promise<UserList> {
  return api.get('/api/users', userListSchema, { signal });
}

export const getUsersQueryOptions = () =>
  queryOptions({
    queryKey: ['users'],
    queryFn: ({ signal }) => getUsers({ signal }),
  });

export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
