import { pageSchema, type SaveDraftRequest } from '@limitbook/contracts';
import { api } from '@/lib/api-client';

export function saveDraft(pageId: string, body: SaveDraftRequest) {
  return api.put(`/api/pages/${pageId}/draft`, body, pageSchema);
}
