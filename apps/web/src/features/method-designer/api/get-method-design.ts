import { methodDesignSchema, type MethodDesign } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

export function getMethodDesign(slug: string, { signal }: { signal?: AbortSignal } = {}): Promise<MethodDesign> {
  return api.get(methodDesignPath(slug), methodDesignSchema, { signal });
}

export const getMethodDesignQueryOptions = (slug: string) => queryOptions({ queryKey: methodDesignKeys.design(slug), queryFn: ({ signal }) => getMethodDesign(slug, { signal }) });

/** One in-house method: its summary and latest released revision (definition and TeX). */
export function useMethodDesign(slug: string, enabled = true) {
  return useQuery({ ...getMethodDesignQueryOptions(slug), enabled });
}
