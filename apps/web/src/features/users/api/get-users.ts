import { userListSchema, type UserList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The most the API hands out in one page; a team larger than this gets paging later. */
export const usersPageLimit = 200;

export function getUsers({ signal }: { signal?: AbortSignal } = {}): Promise<UserList> {
  return api.get('/api/users', userListSchema, { query: { limit: usersPageLimit }, signal });
}

export const getUsersQueryOptions = () =>
  queryOptions({
    queryKey: ['users'],
    queryFn: ({ signal }) => getUsers({ signal }),
  });

export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
