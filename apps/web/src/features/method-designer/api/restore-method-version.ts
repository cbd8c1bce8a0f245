import { methodRevisionSchema } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

export function restoreMethodVersion(slug: string, version: number) {
  return api.post(`${methodDesignPath(slug)}/versions/${version}/restore`, undefined, methodRevisionSchema);
}

/** Admins: an old version becomes the new draft (which goes through review like any other). */
export function useRestoreMethodVersion(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version: number) => restoreMethodVersion(slug, version),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: methodDesignKeys.design(slug) }),
  });
}
