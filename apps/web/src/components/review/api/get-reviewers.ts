import { reviewerListSchema, type ReviewerList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getReviewers({ signal }: { signal?: AbortSignal } = {}): Promise<ReviewerList> {
  return api.get('/api/reviewers', reviewerListSchema, { signal });
}

export const getReviewersQueryOptions = () => queryOptions({ queryKey: ['reviewers'], queryFn: ({ signal }) => getReviewers({ signal }), staleTime: 60_000 });

/** Everyone an author may ask to review (active reviewers and admins). */
export function useReviewers(enabled: boolean) {
  return useQuery({ ...getReviewersQueryOptions(), enabled });
}
