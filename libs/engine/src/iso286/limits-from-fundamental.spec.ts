import { describe, expect, it } from 'vitest';
import { limitsFromFundamental } from './limits-from-fundamental.js';
import { parseToleranceClass } from './parse-tolerance-class.js';
import { standardTolerance } from './standard-tolerance.js';

function classAt(designation: string, side: 'hole' | 'shaft', sizeMm: number) {
  const parsed = parseToleranceClass(designation, side);
  if (!parsed.ok) throw new Error(parsed.message);
  const tolerance = standardTolerance(parsed.value.grade, sizeMm);
  if (!tolerance) throw new Error(`no IT${parsed.value.grade} at ${sizeMm} mm`);
  return { toleranceClass: parsed.value, tolerance };
}

const limitsOf = (result: ReturnType<typeof limitsFromFundamental>) => (result.ok ? [result.value.upper / 100, result.value.lower / 100] : result.message);

describe('limitsFromFundamental', () => {
  it('puts the other limit one IT below an upper fundamental deviation', () => {
    // g6 at 50 mm: es = −9 µm, IT6 = 16 µm, so ei = −25 µm (ISO 286-2:2010 Table 17, 40–50 mm).
    const { toleranceClass, tolerance } = classAt('g6', 'shaft', 50);
    const result = limitsFromFundamental(toleranceClass, tolerance, tolerance.range, { which: 'upper', value: -900, source: { rule: 'table', table: 'g' } });
    expect(limitsOf(result)).toEqual([-9, -25]);
  });

  it('puts the other limit one IT above a lower fundamental deviation, keeping the fundamental as given', () => {
    // H7 at 50 mm: EI = 0, IT7 = 25 µm, so ES = +25 µm (ISO 286-2:2010 Table 2, 40–50 mm).
    const { toleranceClass, tolerance } = classAt('H7', 'hole', 50);
    const fundamental = { which: 'lower', value: 0, source: { rule: 'mirror', shaftDeviation: 0 } } as const;
    const result = limitsFromFundamental(toleranceClass, tolerance, tolerance.range, fundamental);
    expect(limitsOf(result)).toEqual([25, 0]);
    expect(result.ok && result.value.fundamental).toEqual(fundamental);
  });

  it('gives js/JS ±half, even where the half was rounded down and the limits are not IT apart', () => {
    // js7 at 18–30 mm: IT7 = 21 µm, limits ±10 µm (ISO 286-2:2010 Table 13).
    const { toleranceClass, tolerance } = classAt('js7', 'shaft', 25);
    const result = limitsFromFundamental(toleranceClass, tolerance, tolerance.range, { which: 'upper', value: 1000, source: { rule: 'symmetric', evenRounded: true } });
    expect(limitsOf(result)).toEqual([10, -10]);
  });
});
