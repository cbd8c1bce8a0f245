import { storedFileSchema } from '@limitbook/contracts';
import { api } from '@/lib/api-client';

export function uploadFile(file: File) {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.upload('/api/files', form, storedFileSchema);
}
