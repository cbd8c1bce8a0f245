import { methodDesignErrorSchema, methodPreviewResponseSchema, type DesignDefinition, type MethodPreviewResponse } from '@limitbook/contracts';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';

/** A preview answers with a result, or with the server's messages per field (and the TeX of what did parse). */
export type PreviewOutcome =
  | { ok: true; response: MethodPreviewResponse }
  | { ok: false; message: string; fields: Record<string, string>; tex: Record<string, string> };

export async function previewMethod(definition: DesignDefinition, signal?: AbortSignal): Promise<PreviewOutcome> {
  try {
    return { ok: true, response: await api.post('/api/method-designs/preview', { definition, values: {} }, methodPreviewResponseSchema, { signal }) };
  } catch (error) {
    if (isApiError(error) && error.status === 400) {
      const body = methodDesignErrorSchema.safeParse(error.body);
      return { ok: false, message: error.message, fields: error.fields, tex: body.success ? (body.data.tex ?? {}) : {} };
    }
    throw error;
  }
}

export const previewMethodQueryOptions = (definition: DesignDefinition, key: string) =>
  queryOptions({
    queryKey: ['method-preview', key],
    // The signal is read, so a preview whose definition moved on is cancelled rather than awaited.
    queryFn: ({ signal }) => previewMethod(definition, signal),
    staleTime: Infinity,
    gcTime: 60_000,
    retry: false,
    placeholderData: keepPreviousData,
  });
