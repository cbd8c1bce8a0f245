import { type LengthUnit, type TableImportColumn, type TableImportProblem, type TableImportResult } from '@limitbook/contracts';
import { fileTypeFromBuffer } from 'file-type';
import Papa from 'papaparse';
import { type z } from 'zod';
import { MeasurementsException } from './measurements.exception.js';

const MM_PER_INCH = 25.4;

/** Lower case without spaces, underscores or dots, and with the typographic minus as a hyphen: "Measured X" → "measuredx". */
function headerKey(text: string): string {
  return text.toLowerCase().replace(/\u2212/g, '-').replace(/[\s_.]+/g, '');
}

function readUnit(text: string): LengthUnit | undefined {
  const key = text.trim().toLowerCase();
  if (key === 'mm' || key === 'millimetre' || key === 'millimeter' || key === 'millimetres' || key === 'millimeters') return 'mm';
  if (key === 'in' || key === 'inch' || key === 'inches' || key === '"') return 'in';
  return undefined;
}

/** Splits `measuredX [mm]` or `Size (in)` into the name and the unit text. */
function splitHeader(header: string): { name: string; unitText?: string } {
  const match = /^(.*?)\s*[[(]\s*([^\])]*?)\s*[\])]\s*$/.exec(header);
  return match && match[1] ? { name: match[1], unitText: match[2] } : { name: header };
}

function lineStarts(text: string): number[] {
  const starts = [0];
  for (const match of text.matchAll(/\r\n|\n|\r/g)) starts.push(match.index + match[0].length);
  return starts;
}

/** 1-based line of the character at `offset`. */
function lineAt(starts: number[], offset: number): number {
  let low = 0;
  let high = starts.length - 1;
  while (low < high) {
    const middle = (low + high + 1) >> 1;
    if (starts[middle]! <= offset) low = middle;
    else high = middle - 1;
  }
  return low + 1;
}

function numberCell(text: string, decimalComma: boolean): number | string {
  let value = text.replace(/\u2212/g, '-').replace(/\s+/g, '');
  if (decimalComma && /^[+-]?\d*,\d+$/.test(value)) value = value.replace(',', '.');
  return /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(value) ? Number(value) : text;
}

/** Removes the float noise of a unit conversion (0.1 in → 2.5400000000000005 mm) without losing measured digits. */
function converted(value: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return value;
  const result = from === 'in' ? value * MM_PER_INCH : value / MM_PER_INCH;
  return Number(result.toPrecision(12));
}

async function decodeCsv(bytes: Buffer): Promise<string> {
  if (bytes.length === 0) throw MeasurementsException.of('empty');
  const detected = await fileTypeFromBuffer(bytes);
  const spreadsheet = detected?.ext === 'xlsx' || detected?.ext === 'xls' || detected?.ext === 'zip' || detected?.ext === 'cfb';
  if (spreadsheet) throw MeasurementsException.unreadable('The file is a spreadsheet workbook, not a CSV table: save the sheet as CSV (UTF-8) and import that.');
  if (detected || bytes.includes(0)) throw MeasurementsException.unreadable(`The file is not a CSV table: it holds ${detected ? detected.mime : 'binary'} data.`);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw MeasurementsException.unreadable('The file is not a CSV table: it is not UTF-8 text. Save it as CSV (UTF-8).');
  }
  text = text.replace(/^\uFEFF/, '');
  if (text.trim() === '') throw MeasurementsException.of('empty');
  if (text.trimStart().startsWith('<')) throw MeasurementsException.unreadable('The file is not a CSV table: it looks like HTML or XML.');
  return text;
}

export interface TableShape {
  columns: readonly TableImportColumn[];
  /** Validates one row. */
  item: z.ZodType;
  /** Validates the whole list (its length limits). */
  list: z.ZodType;
  /** Label for messages, e.g. "features". */
  name: string;
}

/**
 * Reads a CSV into rows of a method's table input: headers mapped to the item's fields (names or
 * aliases), lengths converted to `unit`, every row validated with the item's schema. Rows that
 * fail are reported with their exact line in the file and left out; the others are returned.
 * Cells are only ever read as text or numbers, never evaluated.
 */
export async function readTableCsv(bytes: Buffer, shape: TableShape, unit: LengthUnit): Promise<TableImportResult> {
  const text = await decodeCsv(bytes);
  const starts = lineStarts(text);
  const records: { cells: string[]; line: number }[] = [];
  let offset = 0;
  let parseProblem: string | undefined;
  let delimiter = ',';
  Papa.parse<string[]>(text, {
    delimitersToGuess: [',', ';', '\t'],
    step: (result) => {
      const start = offset;
      offset = result.meta.cursor;
      delimiter = result.meta.delimiter;
      const error = result.errors.find((entry) => entry.type !== 'Delimiter');
      if (error && !parseProblem) parseProblem = `line ${lineAt(starts, start)}: ${error.message}`;
      const cells = result.data.map((cell) => cell.trim());
      if (cells.every((cell) => cell === '')) return;
      // A row starts after the line break that ended the previous one.
      records.push({ cells: result.data, line: lineAt(starts, start) });
    },
  });
  if (parseProblem) throw MeasurementsException.unreadable(`The file is not a readable CSV table (${parseProblem}).`);
  const [header, ...rows] = records;
  if (!header) throw MeasurementsException.of('empty');

  const expected = `${shape.columns.map((column) => column.field).join(', ')}, and optionally unit`;
  const byKey = new Map<string, TableImportColumn>();
  for (const column of shape.columns) for (const name of [column.field, ...column.aliases]) byKey.set(headerKey(name), column);

  const mapped: { index: number; column: TableImportColumn; header: string; unit?: LengthUnit }[] = [];
  const ignoredColumns: string[] = [];
  let unitIndex: number | undefined;
  header.cells.forEach((raw, index) => {
    const headerText = raw.trim();
    if (headerText === '') return;
    const { name, unitText } = splitHeader(headerText);
    if (headerKey(name) === 'unit' || headerKey(name) === 'units') {
      unitIndex = index;
      return;
    }
    const column = byKey.get(headerKey(name)) ?? byKey.get(headerKey(headerText));
    if (!column) {
      ignoredColumns.push(headerText);
      return;
    }
    const clash = mapped.find((entry) => entry.column === column);
    if (clash) {
      throw MeasurementsException.unreadable(`Line ${header.line}: columns “${clash.header}” and “${headerText}” both read as ${column.field}; keep one.`);
    }
    let columnUnit: LengthUnit | undefined;
    if (unitText !== undefined && byKey.get(headerKey(name)) === column) {
      columnUnit = readUnit(unitText);
      if (column.kind !== 'length') throw MeasurementsException.unreadable(`Line ${header.line}, column “${headerText}”: ${column.field} is not a length and takes no unit.`);
      if (!columnUnit) throw MeasurementsException.unreadable(`Line ${header.line}, column “${headerText}”: unit “${unitText}” is not mm or in.`);
    }
    mapped.push({ index, column, header: headerText, ...(columnUnit ? { unit: columnUnit } : {}) });
  });
  const missing = shape.columns.filter((column) => column.required && !mapped.some((entry) => entry.column === column)).map((column) => column.field);
  if (missing.length > 0) {
    throw MeasurementsException.unreadable(
      `Line ${header.line}: missing column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}. Expected columns: ${expected} (header names are matched without regard to case).`,
    );
  }
  if (rows.length === 0) throw MeasurementsException.unreadable(`The file has a header but no rows. Expected columns: ${expected}.`);

  const good: Record<string, unknown>[] = [];
  const problems: TableImportProblem[] = [];
  const decimalComma = delimiter !== ',';
  for (const { cells, line } of rows) {
    let rowUnit = unit;
    if (unitIndex !== undefined) {
      const unitCell = (cells[unitIndex] ?? '').trim();
      if (unitCell !== '') {
        const read = readUnit(unitCell);
        if (!read) {
          problems.push({ line, field: 'unit', message: `Unit “${unitCell}” is not mm or in` });
          continue;
        }
        rowUnit = read;
      }
    }
    const candidate: Record<string, unknown> = {};
    for (const { index, column, unit: columnUnit } of mapped) {
      const cell = (cells[index] ?? '').trim();
      if (cell === '') continue;
      if (column.kind !== 'text') {
        const value = column.field === 'sense' && (cell === '+' || cell === '-' || cell === '\u2212') ? (cell === '+' ? 1 : -1) : numberCell(cell, decimalComma);
        candidate[column.field] = typeof value === 'number' && column.kind === 'length' ? converted(value, columnUnit ?? rowUnit, unit) : value;
      } else {
        candidate[column.field] = cell;
      }
    }
    const parsed = shape.item.safeParse(candidate);
    if (parsed.success) {
      good.push(parsed.data as Record<string, unknown>);
      continue;
    }
    for (const issue of parsed.error.issues) {
      const field = issue.path.length > 0 ? String(issue.path[0]) : undefined;
      const cell = field !== undefined && typeof candidate[field] === 'string' ? ` (read “${String(candidate[field]).slice(0, 40)}”)` : '';
      problems.push({ line, ...(field !== undefined ? { field } : {}), message: `${issue.message}${cell}` });
    }
  }
  const listCheck = shape.list.safeParse(good);
  const tooMany = listCheck.success ? undefined : listCheck.error.issues.find((issue) => issue.code === 'too_big' && issue.path.length === 0);
  if (tooMany) throw MeasurementsException.unreadable(`The file holds ${good.length} valid rows: ${tooMany.message}.`);

  return { unit, columns: mapped.map((entry) => ({ header: entry.header, field: entry.column.field })), ignoredColumns, rows: good, problems };
}
