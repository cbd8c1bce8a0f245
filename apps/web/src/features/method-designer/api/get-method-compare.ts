import { methodCompareSchema, type MethodCompare } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

/** `from` and `to` are version numbers or `draft`. */
export function getMethodCompare(slug: string, from: string, to: string, { signal }: { signal?: AbortSignal } = {}): Promise<MethodCompare> {
  return api.get(`${methodDesignPath(slug)}/compare`, methodCompareSchema, { signal, query: { from, to } });
}

export const getMethodCompareQueryOptions = (slug: string, from: string, to: string) =>
  queryOptions({ queryKey: methodDesignKeys.compare(slug, from, to), queryFn: ({ signal }) => getMethodCompare(slug, from, to, { signal }) });

export function useMethodCompare(slug: string, from: string | null, to: string | null) {
  return useQuery({ ...getMethodCompareQueryOptions(slug, from ?? '', to ?? ''), enabled: !!from && !!to && from !== to });
}
