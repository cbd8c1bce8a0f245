import { tableImportResultSchema, type LengthUnit } from '@limitbook/contracts';
import { api } from '@/lib/api-client';

/** Reads a CSV on the server into rows of a method's table input; lengths come back in `unit`. */
export function importTableCsv(method: string, input: string, file: File, unit: LengthUnit) {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.upload(`/api/methods/${encodeURIComponent(method)}/tables/${encodeURIComponent(input)}/import`, form, tableImportResultSchema, { query: { unit } });
}
