import { type LengthUnit } from '@limitbook/contracts';
import { MM_PER_INCH, roundTo } from '../core/units.js';

/** Whole micrometres to the request's unit: exact in mm, 7 decimals (0.0001 thou) in inches. */
export function lengthFromMicrometres(micrometres: number, unit: LengthUnit): number {
  const millimetres = micrometres / 1000;
  if (unit === 'mm') return millimetres === 0 ? 0 : millimetres;
  return roundTo(millimetres / MM_PER_INCH, 7);
}

/** A length typed in inches lands on a table bound only up to float noise. */
export function lengthInMm(value: number, unit: LengthUnit): number {
  const millimetres = unit === 'mm' ? value : value * MM_PER_INCH;
  return Math.round(millimetres * 1e9) / 1e9;
}

export function rangeInUnit(range: { over: number; upTo: number | null }, unit: LengthUnit): { over: number; upTo: number | null } {
  if (unit === 'mm') return { over: range.over, upTo: range.upTo };
  const convert = (value: number) => roundTo(value / MM_PER_INCH, 7);
  return { over: convert(range.over), upTo: range.upTo === null ? null : convert(range.upTo) };
}
