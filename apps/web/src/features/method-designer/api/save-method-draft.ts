import { methodRevisionSchema, type SaveMethodDraftRequest } from '@limitbook/contracts';
import { api } from '@/lib/api-client';

export function saveMethodDraft(slug: string, body: SaveMethodDraftRequest) {
  return api.put(`/api/method-designs/${encodeURIComponent(slug)}/draft`, body, methodRevisionSchema);
}
