import { methodDesignSchema, type CreateMethodDesignRequest } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys } from './keys';

export function createMethodDesign(body: CreateMethodDesignRequest) {
  return api.post('/api/method-designs', body, methodDesignSchema);
}

export function useCreateMethodDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMethodDesign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: methodDesignKeys.list() }),
  });
}
