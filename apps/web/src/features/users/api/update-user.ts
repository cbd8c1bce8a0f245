import { userSchema, type UpdateUserRequest, type User } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getUsersQueryOptions } from './get-users';

export type UpdateUserInput = { id: string; changes: UpdateUserRequest };

export function updateUser({ id, changes }: UpdateUserInput): Promise<User> {
  return api.patch(`/api/users/${encodeURIComponent(id)}`, changes, userSchema);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSettled: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
