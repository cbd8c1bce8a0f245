import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { materialConditionSizes } from '../boundary/material-condition-sizes.js';
import { roundTo } from '../core/units.js';
import { featurePosition } from './feature-position.js';

const epsilon = 1e-9;
const at = (dx: number, dy: number, actualSize: number) => ({ basicX: 50, basicY: 20, measuredX: 50 + dx, measuredY: 20 + dy, actualSize });
const r = (value: number) => roundTo(value, 6);

describe('featurePosition', () => {
  // Position = 2·√(Δx² + Δy²): Wikipedia, "Position tolerance" (conversion of X & Y measurements to a position diameter).
  it('converts the offsets to a diameter', () => {
    const result = featurePosition(at(0.03, -0.04, 10.1), materialConditionSizes('internal', 10, 10.2), 0.1, 'MMC', epsilon);
    expect([r(result.dx), r(result.dy), r(result.deviation)]).toEqual([0.03, -0.04, 0.1]);
  });

  // Hole MMC .290, ⌖ .010 at MMC, actual .297, offsets .003 and .002: bonus .007, zone .017, radial offset .0036 < .0085, in spec.
  // Source: "Calculating whether or not a hole is in spec with bonus tolerance", scribd.com/document/479445399/Bonus-tolerance.
  // The example states no upper limit; .300 is assumed here so that .297 lies within size.
  it('accepts the published inch example with its bonus', () => {
    const result = featurePosition(
      { basicX: 1, basicY: 0.5, measuredX: 1.003, measuredY: 0.502, actualSize: 0.297 },
      materialConditionSizes('internal', 0.29, 0.3),
      0.01,
      'MMC',
      epsilon,
    );
    expect(r(result.bonus)).toBe(0.007);
    expect(r(result.allowed)).toBe(0.017);
    expect(roundTo(result.deviation / 2, 4)).toBe(0.0036);
    expect(result.positionConforms).toBe(true);
  });

  // Hole MMC .499 measuring .502 earns .003 bonus over the stated ⌖ .015 (ignoring orientation): allowed .018.
  // Source: dimcax.com GD&T tip, August 1997, "Calculating additional tolerance permitted when a position tolerance is modified at MMC"
  // (the tip gives .016 allowed after losing .002 to perpendicularity, so the stated tolerance is .015 [D]). Upper limit .509 assumed.
  it('gives the bonus of the dimcax example', () => {
    const hole = materialConditionSizes('internal', 0.499, 0.509);
    const result = featurePosition(at(0.006, 0.006, 0.502), hole, 0.015, 'MMC', epsilon);
    expect(r(result.bonus)).toBe(0.003);
    expect(r(result.allowed)).toBe(0.018);
    // [D] 2·√(0.006² + 0.006²) = 0.01697: beyond the stated .015, within .018 with the bonus.
    expect(roundTo(result.deviation, 5)).toBe(0.01697);
    expect(result.positionConforms).toBe(true);
    expect(featurePosition(at(0.006, 0.006, 0.499), hole, 0.015, 'MMC', epsilon).positionConforms).toBe(false);
  });

  // reference.md §4 [D]: hole Ø10.0–10.2, ⌖ Ø0.1 — at MMC the bonus is the departure from 10.0; at LMC from 10.2; none at RFS.
  it('takes the bonus from the stated material condition (reference.md §4)', () => {
    const hole = materialConditionSizes('internal', 10, 10.2);
    expect(r(featurePosition(at(0, 0, 10.15), hole, 0.1, 'MMC', epsilon).allowed)).toBe(0.25);
    expect(r(featurePosition(at(0, 0, 10.15), hole, 0.1, 'LMC', epsilon).allowed)).toBe(0.15);
    expect(r(featurePosition(at(0, 0, 10.15), hole, 0.1, 'RFS', epsilon).allowed)).toBe(0.1);
    const pin = materialConditionSizes('external', 9.8, 10);
    expect(r(featurePosition(at(0, 0, 9.85), pin, 0.1, 'MMC', epsilon).bonus)).toBe(0.15);
  });

  it('fails a feature outside its size limits on size, with no bonus', () => {
    const result = featurePosition(at(0, 0, 10.25), materialConditionSizes('internal', 10, 10.2), 0.1, 'MMC', epsilon);
    expect(result.sizeConforms).toBe(false);
    expect(result.bonus).toBe(0);
    expect(result.positionConforms).toBe(false);
  });

  it('judges a deviation exactly on the limit as conforming despite binary noise', () => {
    // 2·√(0.03² + 0.04²) = 0.1 exactly in decimals; in binary it lands a few ulps either side.
    const result = featurePosition({ basicX: 123.45, basicY: 67.89, measuredX: 123.48, measuredY: 67.93, actualSize: 10 }, materialConditionSizes('internal', 10, 10.2), 0.1, 'MMC', 1e-9 * 123.48);
    expect(result.positionConforms).toBe(true);
  });

  it('always accepts a feature at true position, at any size within its limits and any modifier', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('internal' as const, 'external' as const),
        fc.constantFrom('MMC' as const, 'LMC' as const, 'RFS' as const),
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        (type, modifier, lower, sizeTolerance, where, tolerance, x) => {
          const result = featurePosition(
            { basicX: x, basicY: -x, measuredX: x, measuredY: -x, actualSize: lower + where * sizeTolerance },
            materialConditionSizes(type, lower, lower + sizeTolerance),
            tolerance,
            modifier,
            1e-9 * Math.max(1, Math.abs(x), lower + sizeTolerance),
          );
          expect(result.positionConforms).toBe(true);
        },
      ),
    );
  });

  it('never gives a negative bonus nor one above the size tolerance (reference.md §4 [C])', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('internal' as const, 'external' as const),
        fc.constantFrom('MMC' as const, 'LMC' as const, 'RFS' as const),
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: -1, max: 2, noNaN: true }),
        (type, modifier, lower, sizeTolerance, where) => {
          const result = featurePosition(at(0.01, 0.01, lower + where * sizeTolerance), materialConditionSizes(type, lower, lower + sizeTolerance), 0.1, modifier, 1e-9);
          expect(result.bonus).toBeGreaterThanOrEqual(0);
          expect(result.bonus).toBeLessThanOrEqual(sizeTolerance + 1e-12);
          if (modifier === 'RFS') expect(result.bonus).toBe(0);
        },
      ),
    );
  });
});
