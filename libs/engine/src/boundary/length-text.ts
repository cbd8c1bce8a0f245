import type { LengthUnit } from '@limitbook/contracts';
import { formatLength } from '../core/units.js';

/** A length for a derivation step's value column: rounded to the unit's resolution, with its unit. */
export function lengthText(value: number, unit: LengthUnit): string {
  return `${formatLength(value, unit)} ${unit}`;
}
