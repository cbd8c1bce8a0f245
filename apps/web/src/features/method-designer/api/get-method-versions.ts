import { methodRevisionSchema, methodVersionListSchema, type MethodRevision, type MethodVersionList } from '@limitbook/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { methodDesignKeys, methodDesignPath } from './keys';

export function getMethodVersions(slug: string, { signal }: { signal?: AbortSignal } = {}): Promise<MethodVersionList> {
  return api.get(`${methodDesignPath(slug)}/versions`, methodVersionListSchema, { signal });
}

export const getMethodVersionsQueryOptions = (slug: string) => queryOptions({ queryKey: methodDesignKeys.versions(slug), queryFn: ({ signal }) => getMethodVersions(slug, { signal }) });

/** Released and superseded versions, newest first (editors also see the open revision). */
export function useMethodVersions(slug: string) {
  return useQuery(getMethodVersionsQueryOptions(slug));
}

export function getMethodVersion(slug: string, version: number, { signal }: { signal?: AbortSignal } = {}): Promise<MethodRevision> {
  return api.get(`${methodDesignPath(slug)}/versions/${version}`, methodRevisionSchema, { signal });
}

export const getMethodVersionQueryOptions = (slug: string, version: number) =>
  queryOptions({ queryKey: methodDesignKeys.version(slug, version), queryFn: ({ signal }) => getMethodVersion(slug, version, { signal }), staleTime: Infinity });
