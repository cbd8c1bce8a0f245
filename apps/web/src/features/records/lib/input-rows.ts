import { formatNumber, type Field } from '@/components/calculator';

export type InputRow = { path: string; label: string; value: string; length: boolean };

function labelsOf(fields: Field[], into = new Map<string, { label: string; length: boolean }>()) {
  for (const field of fields) {
    into.set(field.path, { label: field.label, length: field.kind === 'number' && field.length });
    if (field.kind === 'object') labelsOf(field.fields, into);
    if (field.kind === 'table') for (const column of field.columns) into.set(`${field.path}.*.${column.name}`, { label: column.label, length: column.kind === 'number' && column.length });
  }
  return into;
}

function display(value: unknown): string {
  if (typeof value === 'number') return formatNumber(value);
  if (value === null || value === undefined) return '—';
  if (typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return JSON.stringify(value);
}

/**
 * A record's inputs as one row per value, nested objects and table rows written out
 * (`Datum feature › Lower limit of size`, `Contributors 2 › Nominal`), labelled from the
 * method's input fields where it has them.
 */
export function inputRows(inputs: Record<string, unknown>, fields: Field[]): InputRow[] {
  const meta = labelsOf(fields);
  const rows: InputRow[] = [];
  const walk = (value: unknown, path: string, labels: string[]) => {
    if (Array.isArray(value) && value.some((item) => item !== null && typeof item === 'object')) {
      value.forEach((item, index) => walk(item, `${path}.${index}`, [...labels.slice(0, -1), `${labels.at(-1) ?? path} ${index + 1}`]));
      return;
    }
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
      for (const [key, child] of Object.entries(value as Record<string, unknown>)) {
        const childPath = path ? `${path}.${key}` : key;
        const known = meta.get(childPath) ?? meta.get(childPath.replace(/\.\d+\./, '.*.'));
        walk(child, childPath, [...labels, known?.label ?? key]);
      }
      return;
    }
    const known = meta.get(path) ?? meta.get(path.replace(/\.\d+\./, '.*.'));
    rows.push({ path, label: labels.join(' › '), value: display(value), length: known?.length ?? false });
  };
  walk(inputs, '', []);
  // In the order the method's form shows them; values the method does not describe go last.
  const order = [...meta.keys()];
  const rank = (path: string) => {
    const index = order.findIndex((key) => key === path || key === path.replace(/\.\d+\./, '.*.'));
    return index === -1 ? order.length : index;
  };
  return rows.map((row, index) => ({ row, index })).sort((a, b) => rank(a.row.path) - rank(b.row.path) || a.index - b.index).map(({ row }) => row);
}
