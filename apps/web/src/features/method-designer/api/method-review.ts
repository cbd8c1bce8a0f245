import { methodRevisionSchema, type ApproveRequest, type SendBackRequest, type SubmitForReviewRequest } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { getMethodsQueryOptions } from '@/components/calculator';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

export function submitMethodForReview(slug: string, body: SubmitForReviewRequest) {
  return api.post(`${methodDesignPath(slug)}/draft/submit`, body, methodRevisionSchema);
}

export function withdrawMethodFromReview(slug: string) {
  return api.post(`${methodDesignPath(slug)}/draft/withdraw`, undefined, methodRevisionSchema);
}

export function approveMethodRevision(slug: string, body: ApproveRequest) {
  return api.post(`${methodDesignPath(slug)}/draft/approve`, body, methodRevisionSchema);
}

export function sendBackMethodRevision(slug: string, body: SendBackRequest) {
  return api.post(`${methodDesignPath(slug)}/draft/send-back`, body, methodRevisionSchema);
}

type Decision = { kind: 'approve'; body: ApproveRequest } | { kind: 'send-back'; body: SendBackRequest };

/** Approve or send back; a release changes the catalog every calculator picks methods from. */
export function useMethodReviewDecision(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (decision: Decision) => (decision.kind === 'approve' ? approveMethodRevision(slug, decision.body) : sendBackMethodRevision(slug, decision.body)),
    // After a decision the open revision is released, or a draft a reviewer may not read: the page
    // being left keeps the answer, and everything is marked stale rather than refetched into a 404.
    onSuccess: async (revision, decision) => {
      queryClient.setQueryData(methodDesignKeys.draft(slug), revision);
      await queryClient.invalidateQueries({ queryKey: methodDesignKeys.all, refetchType: 'none' });
      if (decision.kind === 'approve') await queryClient.invalidateQueries({ queryKey: getMethodsQueryOptions().queryKey });
    },
  });
}
