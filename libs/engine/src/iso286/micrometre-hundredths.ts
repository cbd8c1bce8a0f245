import { type LengthUnit } from '@limitbook/contracts';
import { formatNumber, MM_PER_INCH, roundTo } from '../core/units.js';

/**
 * ISO 286 values are exact decimals down to 0.05 µm (IT01 = 0.3 µm, js3 at 3–6 mm = ±1.25 µm),
 * so every deviation is held as an integer count of 0.01 µm: sums and differences stay exact.
 */
export type MicrometreHundredths = number;

export function hundredthsFromMicrometres(micrometres: number): MicrometreHundredths {
  return Math.round(micrometres * 100);
}

/** Inch results keep 7 decimals (0.0001 thou, 0.00254 µm): finer than the standard's 0.05 µm step. */
export const inchDecimals = 7;

/** A deviation in the request's unit: mm exactly (an integer over a power of ten), inch rounded. */
export function hundredthsToLength(value: MicrometreHundredths, unit: LengthUnit): number {
  const millimetres = value / 100_000;
  if (unit === 'mm') return millimetres === 0 ? 0 : millimetres;
  return roundTo(millimetres / MM_PER_INCH, inchDecimals);
}

export function micrometresText(value: MicrometreHundredths): string {
  return formatNumber(value / 100, 2);
}

export function signedMicrometresText(value: MicrometreHundredths): string {
  return value > 0 ? `+${micrometresText(value)}` : micrometresText(value);
}

/** For substitution into a LaTeX formula: negative values in parentheses. */
export function micrometresLatex(value: MicrometreHundredths): string {
  const text = micrometresText(value);
  return value < 0 ? `\\left(${text}\\right)` : text;
}
