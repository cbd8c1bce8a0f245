import { userSchema, type InviteUserRequest, type User } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getUsersQueryOptions } from './get-users';

export function inviteUser(body: InviteUserRequest): Promise<User> {
  return api.post('/api/users/invitations', body, userSchema);
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
