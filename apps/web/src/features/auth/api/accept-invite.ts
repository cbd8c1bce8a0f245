import type { AcceptInviteRequest } from '@limitbook/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function acceptInvite(body: AcceptInviteRequest): Promise<void> {
  return api.send('/api/auth/accept-invite', { method: 'POST', body, anonymous: true });
}

export function useAcceptInvite() {
  return useMutation({ mutationFn: acceptInvite });
}
