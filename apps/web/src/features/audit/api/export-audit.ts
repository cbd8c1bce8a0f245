import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AuditFilters } from './get-audit-events';

/** The export needs the bearer token, so it is fetched here and handed to the browser as a file. */
export async function exportAuditCsv(filters: AuditFilters): Promise<void> {
  const { blob, filename } = await api.download('/api/audit/export.csv', { query: filters });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename ?? `limitbook-audit-${new Date().toISOString().slice(0, 10)}.csv`;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export function useExportAudit() {
  return useMutation({ mutationFn: exportAuditCsv });
}
