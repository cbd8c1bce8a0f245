import { z } from 'zod';
import { lengthUnitSchema } from './length-unit.js';

/** Largest CSV accepted by a table import: far above 500 measured rows, small enough to parse inline. */
export const maxTableImportBytes = 1024 * 1024;

/** A column a CSV import fills: the item's field, the header names it also answers to, and how its cells are read. */
export interface TableImportColumn {
  field: string;
  required: boolean;
  /** Lengths are converted between units; numbers are read as numbers; text is kept as typed, never evaluated. */
  kind: 'text' | 'number' | 'length';
  aliases: readonly string[];
}

/**
 * The method inputs that take a table (a list of objects) from CSV, with their columns. Headers
 * match case-insensitively, ignoring spaces, underscores and dots; a `unit` column (mm or in) or
 * a header suffix such as `measuredX [mm]` or `Size (in)` gives the unit of the lengths.
 */
export const importableTables: Record<string, Record<string, readonly TableImportColumn[]>> = {
  'position-check': {
    features: [
      { field: 'label', required: true, kind: 'text', aliases: ['name', 'feature', 'hole', 'id'] },
      { field: 'basicX', required: true, kind: 'length', aliases: ['basic x', 'nominal x', 'true x', 'x basic', 'x nominal'] },
      { field: 'basicY', required: true, kind: 'length', aliases: ['basic y', 'nominal y', 'true y', 'y basic', 'y nominal'] },
      { field: 'measuredX', required: true, kind: 'length', aliases: ['x', 'measured x', 'actual x', 'x measured', 'x actual'] },
      { field: 'measuredY', required: true, kind: 'length', aliases: ['y', 'measured y', 'actual y', 'y measured', 'y actual'] },
      { field: 'actualSize', required: true, kind: 'length', aliases: ['size', 'actual size', 'measured size', 'diameter', 'dia', 'ø', '⌀'] },
    ],
  },
  'stack-1d': {
    contributors: [
      { field: 'name', required: true, kind: 'text', aliases: ['contributor', 'part', 'description'] },
      { field: 'sense', required: true, kind: 'number', aliases: ['direction', 'sign'] },
      { field: 'nominal', required: true, kind: 'length', aliases: ['nom', 'dimension'] },
      { field: 'plusTol', required: true, kind: 'length', aliases: ['plus', '+tol', 'tol+', 'plus tol', 'plus tolerance', 'upper tol'] },
      { field: 'minusTol', required: true, kind: 'length', aliases: ['minus', '-tol', 'tol-', 'minus tol', 'minus tolerance', 'lower tol'] },
      { field: 'distribution', required: false, kind: 'text', aliases: ['dist'] },
      { field: 'cpk', required: false, kind: 'number', aliases: [] },
      { field: 'sigma', required: false, kind: 'length', aliases: ['σ', 'std dev', 'stdev', 'standard deviation'] },
    ],
  },
};

export const tableImportParamsSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9][a-z0-9-]{0,99}$/, 'Method ids are lower-case letters, digits and hyphens'),
  input: z.string().regex(/^[A-Za-z][A-Za-z0-9]{0,63}$/, 'Input names are letters and digits'),
});
export type TableImportParams = z.infer<typeof tableImportParamsSchema>;

export const tableImportQuerySchema = z.strictObject({
  unit: lengthUnitSchema.default('mm').describe('Unit the rows are returned in; lengths in the file without a unit are read in it too.'),
});
export type TableImportQuery = z.infer<typeof tableImportQuerySchema>;

export const tableImportProblemSchema = z.object({
  /** Line of the file, counting from 1 at the header. */
  line: z.number().int(),
  field: z.string().optional(),
  message: z.string(),
});
export type TableImportProblem = z.infer<typeof tableImportProblemSchema>;

export const tableImportResultSchema = z.object({
  unit: lengthUnitSchema,
  /** The fields each header was read as; columns that match none are listed in `ignoredColumns`. */
  columns: z.array(z.object({ header: z.string(), field: z.string() })),
  ignoredColumns: z.array(z.string()),
  /** Rows that passed the item's validation, lengths in `unit`. */
  rows: z.array(z.record(z.string(), z.unknown())),
  problems: z.array(tableImportProblemSchema),
});
export type TableImportResult = z.infer<typeof tableImportResultSchema>;
