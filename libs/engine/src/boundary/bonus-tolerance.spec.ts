import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundTo } from '../core/units.js';
import { bonusTolerance } from './bonus-tolerance.js';
import { materialConditionSizes } from './material-condition-sizes.js';

const hole = materialConditionSizes('internal', 10, 10.2);
const pin = materialConditionSizes('external', 9.8, 10);

describe('bonusTolerance', () => {
  // Bonus is the departure of the actual size from the stated material condition (reference.md §4 [C]).
  it('grows from zero at MMC to the size tolerance at LMC for a tolerance at MMC', () => {
    expect(bonusTolerance(10, 'MMC', hole)).toBe(0);
    expect(roundTo(bonusTolerance(10.15, 'MMC', hole), 6)).toBe(0.15);
    expect(roundTo(bonusTolerance(9.9, 'MMC', pin), 6)).toBe(0.1);
  });

  it('grows from zero at LMC to the size tolerance at MMC for a tolerance at LMC', () => {
    expect(bonusTolerance(10.2, 'LMC', hole)).toBe(0);
    expect(roundTo(bonusTolerance(10, 'LMC', hole), 6)).toBe(0.2);
    expect(roundTo(bonusTolerance(9.85, 'LMC', pin), 6)).toBe(0.05);
  });

  it('is zero at RFS', () => {
    expect(bonusTolerance(10.1, 'RFS', hole)).toBe(0);
  });

  it('earns nothing outside the size limits', () => {
    expect(bonusTolerance(9.9, 'MMC', hole)).toBe(0);
    expect(roundTo(bonusTolerance(10.5, 'MMC', hole), 6)).toBe(0.2);
  });

  it('is never negative and never more than the size tolerance (reference.md §4 [C])', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('internal' as const, 'external' as const),
        fc.constantFrom('MMC' as const, 'LMC' as const, 'RFS' as const),
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: -0.5, max: 1.5, noNaN: true }),
        (type, modifier, lower, sizeTolerance, position) => {
          const sizes = materialConditionSizes(type, lower, lower + sizeTolerance);
          const bonus = bonusTolerance(lower + position * sizeTolerance, modifier, sizes);
          expect(bonus).toBeGreaterThanOrEqual(0);
          expect(bonus).toBeLessThanOrEqual(sizeTolerance + 1e-12);
        },
      ),
    );
  });
});
