import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RecordFilters } from './get-records';

/** Hands fetched bytes to the browser as a download (the files need the bearer token, so no plain link). */
function saveBlob(blob: Blob, filename: string) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export async function downloadRecordPdf(id: string): Promise<void> {
  const { blob, filename } = await api.download(`/api/records/${encodeURIComponent(id)}.pdf`);
  saveBlob(blob, filename ?? `limitbook-record-${id}.pdf`);
}

/** The selected records (`ids`) or everything the filters match, as CSV. */
export async function exportRecordsCsv(selection: { ids?: string[]; filters?: RecordFilters }): Promise<void> {
  const query = selection.ids ? { ids: selection.ids.join(',') } : (selection.filters ?? {});
  const { blob, filename } = await api.download('/api/records/export.csv', { query });
  saveBlob(blob, filename ?? `limitbook-records-${new Date().toISOString().slice(0, 10)}.csv`);
}

export function useDownloadRecordPdf() {
  return useMutation({ mutationFn: downloadRecordPdf });
}

export function useExportRecords() {
  return useMutation({ mutationFn: exportRecordsCsv });
}
