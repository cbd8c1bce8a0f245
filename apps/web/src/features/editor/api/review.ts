import { pageSchema, reviewerListSchema, type SubmitForReviewRequest } from '@limitbook/contracts';
import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function submitForReview(pageId: string, body: SubmitForReviewRequest) {
  return api.post(`/api/pages/${pageId}/draft/submit`, body, pageSchema);
}

export function withdrawFromReview(pageId: string) {
  return api.post(`/api/pages/${pageId}/draft/withdraw`, undefined, pageSchema);
}

/** Everyone an author may ask to review (active reviewers and admins). */
export function useReviewers(enabled: boolean) {
  return useQuery({
    queryKey: ['reviewers'],
    queryFn: () => api.get('/api/reviewers', reviewerListSchema),
    enabled,
    staleTime: 60_000,
  });
}
