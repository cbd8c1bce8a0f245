import { pageSchema, type SubmitForReviewRequest } from '@limitbook/contracts';
import { api } from '@/lib/api-client';

export function submitForReview(pageId: string, body: SubmitForReviewRequest) {
  return api.post(`/api/pages/${pageId}/draft/submit`, body, pageSchema);
}

export function withdrawFromReview(pageId: string) {
  return api.post(`/api/pages/${pageId}/draft/withdraw`, undefined, pageSchema);
}
