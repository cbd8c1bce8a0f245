import type { InviteUserRequest } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getUsersQueryOptions } from './get-users';

export function inviteUser(body: InviteUserRequest): Promise<void> {
  return api.send('/api/users/invitations', { method: 'POST', body });
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
