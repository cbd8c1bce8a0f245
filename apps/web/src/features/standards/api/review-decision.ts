import { pageSchema, type ApproveRequest, type SendBackRequest } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function approveRevision(pageId: string, body: ApproveRequest) {
  return api.post(`/api/pages/${pageId}/draft/approve`, body, pageSchema);
}

export function sendBackRevision(pageId: string, body: SendBackRequest) {
  return api.post(`/api/pages/${pageId}/draft/send-back`, body, pageSchema);
}

type Decision = { kind: 'approve'; body: ApproveRequest } | { kind: 'send-back'; body: SendBackRequest };

/**
 * Approves or sends back the revision in review. Afterwards the open revision is gone for a
 * reviewer (released, or a draft they may not see), so its cached view is dropped rather than
 * refetched into a 404, and the released view is refreshed.
 */
export function useReviewDecision(pageId: string, documentNumber: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (decision: Decision) => (decision.kind === 'approve' ? approveRevision(pageId, decision.body) : sendBackRevision(pageId, decision.body)),
    onSuccess: () => {
      const ref = documentNumber.toUpperCase();
      queryClient.removeQueries({ queryKey: ['page', ref, 'draft'] });
      return queryClient.invalidateQueries({ queryKey: ['page', ref, 'released'], refetchType: 'none' });
    },
  });
}
