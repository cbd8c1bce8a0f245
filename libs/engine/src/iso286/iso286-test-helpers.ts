import { holeLimitDeviations } from './hole-limit-deviations.js';
import { parseToleranceClass } from './parse-tolerance-class.js';
import { shaftLimitDeviations } from './shaft-limit-deviations.js';

/** [upper, lower] deviation in µm of a tolerance class at a size in mm, or the "not defined" message. */
export function deviationsMicrometres(designation: string, sizeMm: number): [number, number] | string {
  const side = designation[0] === designation[0]?.toUpperCase() ? 'hole' : 'shaft';
  const parsed = parseToleranceClass(designation, side);
  if (!parsed.ok) throw new Error(parsed.message);
  const result = side === 'hole' ? holeLimitDeviations(parsed.value, sizeMm) : shaftLimitDeviations(parsed.value, sizeMm);
  return result.ok ? [result.value.upper / 100, result.value.lower / 100] : result.message;
}
