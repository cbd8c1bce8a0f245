import type { ResetPasswordRequest } from '@limitbook/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function resetPassword(body: ResetPasswordRequest): Promise<void> {
  return api.send('/api/auth/reset-password', { method: 'POST', body, anonymous: true });
}

export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
