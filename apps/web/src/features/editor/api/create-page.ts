import { pageSchema, type CreatePageRequest } from '@limitbook/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function createPage(body: CreatePageRequest) {
  return api.post('/api/pages', body, pageSchema);
}

export function useCreatePage() {
  return useMutation({ mutationFn: createPage });
}
