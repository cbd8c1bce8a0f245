import { mainStepUpperBounds } from './tables/size-steps.js';
import { findSizeStep, type SizeStep } from './find-size-step.js';

export type DeviationRows = readonly (readonly [number, ...(number | null)[]])[];

export interface DeviationCell {
  /** µm as tabulated; null where the standard leaves the cell empty. */
  value: number | null;
  /** The table row, widened to the main range when every row inside it holds the same value. */
  step: SizeStep;
}

/** Reads column `column` (0 = first value column) of a table whose rows start with their upper bound in mm. */
export function lookupDeviationCell(rows: DeviationRows, column: number, sizeMm: number): DeviationCell | undefined {
  const bounds = rows.map((row) => row[0]);
  const step = findSizeStep(sizeMm, bounds);
  if (!step) return undefined;
  const value = rows[step.index]?.[column + 1] ?? null;

  const main = findSizeStep(sizeMm, mainStepUpperBounds);
  if (main && (main.over !== step.over || main.upTo !== step.upTo)) {
    const inMain = rows.filter((row) => row[0] > main.over && row[0] <= main.upTo);
    if (inMain.every((row) => (row[column + 1] ?? null) === value)) return { value, step: { ...main } };
  }
  return { value, step };
}

/** "over 24 mm up to 3150 mm": where a column has values, for error messages. */
export function definedSpanText(rows: DeviationRows, column: number): string {
  const defined = rows.map((row, index) => ({ index, value: row[column + 1] ?? null })).filter((cell) => cell.value !== null);
  const first = defined[0];
  const last = defined.at(-1);
  if (!first || !last) return 'nowhere';
  const over = first.index === 0 ? 0 : (rows[first.index - 1]?.[0] as number);
  const upTo = rows[last.index]?.[0] as number;
  return over === 0 ? `up to ${upTo} mm` : `over ${over} mm up to ${upTo} mm`;
}

/** The cell, or the standard's span for that letter as a "not defined" message. */
export function requireDeviationCell(
  rows: DeviationRows,
  column: number,
  sizeMm: number,
  designation: string,
  letter: string,
): { ok: true; value: number; step: SizeStep } | { ok: false; message: string } {
  const cell = lookupDeviationCell(rows, column, sizeMm);
  if (!cell || cell.value === null) {
    return { ok: false, message: `${designation}: ISO 286-1 gives the fundamental deviation ${letter} only ${definedSpanText(rows, column)}` };
  }
  return { ok: true, value: cell.value, step: cell.step };
}
