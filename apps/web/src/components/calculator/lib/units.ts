import type { LengthUnit } from '@limitbook/contracts';
import { getAtPath, lengthPaths, setAtPath, type Field } from './json-schema';

const mmPerInch = 25.4;

/**
 * A length in another unit, rounded so that a round trip gives back what was typed:
 * six decimals in inch (a tenth of a micro-inch), four in mm.
 */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return value;
  const converted = to === 'in' ? value / mmPerInch : value * mmPerInch;
  const decimals = to === 'in' ? 6 : 4;
  return Number(converted.toFixed(decimals));
}

/** The inputs with every length field converted; counts, ratios and formula quantities stay as they are. */
export function convertInputs(inputs: Record<string, unknown>, fields: Field[], from: LengthUnit, to: LengthUnit): Record<string, unknown> {
  if (from === to) return inputs;
  let next = inputs;
  for (const path of lengthPaths(fields, inputs)) {
    const value = getAtPath(inputs, path);
    if (typeof value === 'number') next = setAtPath(next, path, convertLength(value, from, to));
  }
  return next;
}
