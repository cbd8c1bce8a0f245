import type { LengthUnit } from '@limitbook/contracts';

export const MM_PER_INCH = 25.4;

/** Decimal places kept in lengths shown to users: 0.1 µm in mm, 0.01 thou in inches. */
export const lengthDecimals: Record<LengthUnit, number> = { mm: 4, in: 5 };

export function toMm(value: number, unit: LengthUnit): number {
  return unit === 'mm' ? value : value * MM_PER_INCH;
}

export function fromMm(valueMm: number, unit: LengthUnit): number {
  return unit === 'mm' ? valueMm : valueMm / MM_PER_INCH;
}

/** Rounds half away from zero at `decimals` places, removing binary noise such as 10.2 − 10.0 = 0.1999…93. */
export function roundTo(value: number, decimals: number): number {
  if (!Number.isFinite(value)) return value;
  const factor = 10 ** decimals;
  const scaled = Math.abs(value) * factor;
  // Snap float error in the scaled value (2.675 × 100 = 267.4999…) before rounding.
  const snapped = Math.round(scaled * 1e6) / 1e6;
  const rounded = Math.round(snapped) / factor;
  const result = Math.sign(value) * rounded;
  return Object.is(result, -0) ? 0 : result;
}

export function roundLength(value: number, unit: LengthUnit): number {
  return roundTo(value, lengthDecimals[unit]);
}

/** A length as text without float noise or trailing zeros beyond what the unit needs. */
export function formatLength(value: number, unit: LengthUnit): string {
  return formatNumber(roundLength(value, unit), lengthDecimals[unit]);
}

export function formatNumber(value: number, maxDecimals = 6): string {
  if (!Number.isFinite(value)) return String(value);
  const text = roundTo(value, maxDecimals).toFixed(maxDecimals);
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/** The LaTeX unit suffix for a length. */
export function latexUnit(unit: LengthUnit): string {
  return unit === 'mm' ? '\\,\\text{mm}' : '\\,\\text{in}';
}

/** A length as LaTeX with its unit, negative values parenthesised so substituted formulas read right. */
export function latexLength(value: number, unit: LengthUnit, parenthesiseNegative = false): string {
  const text = formatLength(value, unit);
  const body = `${text}${latexUnit(unit)}`;
  return parenthesiseNegative && text.startsWith('-') ? `\\left(${body}\\right)` : body;
}
