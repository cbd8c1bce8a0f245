import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { session } from '@/lib/session';

export function signOut(): Promise<void> {
  return api.send('/api/auth/sign-out', { method: 'POST' });
}

export function useSignOut({ onSettled }: { onSettled?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    // Whatever the server says, this tab forgets the session and everything it fetched.
    onSettled: () => {
      session.signOut('signed-out');
      queryClient.clear();
      onSettled?.();
    },
  });
}
