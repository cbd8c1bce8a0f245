import type { ForgotPasswordRequest } from '@limitbook/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function requestPasswordReset(body: ForgotPasswordRequest): Promise<void> {
  return api.send('/api/auth/forgot-password', { method: 'POST', body, anonymous: true });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
