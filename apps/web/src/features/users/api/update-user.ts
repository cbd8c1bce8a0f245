import type { UpdateUserRequest } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getUsersQueryOptions } from './get-users';

export type UpdateUserInput = { id: string; changes: UpdateUserRequest };

export function updateUser({ id, changes }: UpdateUserInput): Promise<void> {
  return api.send(`/api/users/${encodeURIComponent(id)}`, { method: 'PATCH', body: changes });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSettled: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
