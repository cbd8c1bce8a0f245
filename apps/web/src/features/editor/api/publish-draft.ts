import { pageSchema } from '@limitbook/contracts';
import { api } from '@/lib/api-client';

export function publishDraft(pageId: string, baseVersion: number) {
  return api.post(`/api/pages/${pageId}/publish`, { baseVersion }, pageSchema);
}
