import { methodRevisionSchema } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

export function startMethodDraft(slug: string) {
  return api.post(`${methodDesignPath(slug)}/draft`, undefined, methodRevisionSchema);
}

/** Opens the next version's draft from the latest release. */
export function useStartMethodDraft(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startMethodDraft(slug),
    onSuccess: (draft) => {
      queryClient.setQueryData(methodDesignKeys.draft(slug), draft);
      return queryClient.invalidateQueries({ queryKey: methodDesignKeys.list() });
    },
  });
}
