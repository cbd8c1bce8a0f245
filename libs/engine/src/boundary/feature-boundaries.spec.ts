import { describe, expect, it } from 'vitest';
import { roundTo } from '../core/units.js';
import { featureBoundaries, type FeatureBoundaries } from './feature-boundaries.js';
import { materialConditionSizes } from './material-condition-sizes.js';

const rounded = (boundaries: FeatureBoundaries) =>
  Object.fromEntries(Object.entries(boundaries).map(([key, value]) => [key, value === null ? null : roundTo(value, 6)]));

describe('featureBoundaries', () => {
  const hole = materialConditionSizes('internal', 10, 10.2);
  const pin = materialConditionSizes('external', 9.8, 10);

  // reference.md §4, worked numbers [D] (derived from the ASME Y14.5-2018 boundary table, §4).
  it('hole Ø10.0–10.2, position Ø0.1 at MMC: virtual 9.9, resultant 10.5', () => {
    expect(rounded(featureBoundaries('internal', 'MMC', hole, 0.1))).toEqual({ virtualCondition: 9.9, resultantCondition: 10.5, innerBoundary: 9.9, outerBoundary: 10.5 });
  });

  it('hole Ø10.0–10.2, position Ø0.1 at LMC: virtual 10.3, resultant 9.7', () => {
    expect(rounded(featureBoundaries('internal', 'LMC', hole, 0.1))).toEqual({ virtualCondition: 10.3, resultantCondition: 9.7, innerBoundary: 9.7, outerBoundary: 10.3 });
  });

  it('hole Ø10.0–10.2, position Ø0.1 at RFS: inner 9.9, outer 10.3, no virtual or resultant condition', () => {
    expect(rounded(featureBoundaries('internal', 'RFS', hole, 0.1))).toEqual({ virtualCondition: null, resultantCondition: null, innerBoundary: 9.9, outerBoundary: 10.3 });
  });

  // reference.md §4 [D]; the external resultant rows are [M] by symmetry with the internal ones.
  it('pin Ø9.8–10.0, position Ø0.1 at MMC: virtual 10.1, resultant 9.5', () => {
    expect(rounded(featureBoundaries('external', 'MMC', pin, 0.1))).toEqual({ virtualCondition: 10.1, resultantCondition: 9.5, innerBoundary: 9.5, outerBoundary: 10.1 });
  });

  it('pin Ø9.8–10.0, position Ø0.1 at LMC: virtual 9.7, resultant 10.3', () => {
    expect(rounded(featureBoundaries('external', 'LMC', pin, 0.1))).toEqual({ virtualCondition: 9.7, resultantCondition: 10.3, innerBoundary: 9.7, outerBoundary: 10.3 });
  });

  it('pin Ø9.8–10.0, position Ø0.1 at RFS: inner LMC − t = 9.7, outer MMC + t = 10.1 (reference.md §4 table; external rows from memory, by symmetry)', () => {
    expect(rounded(featureBoundaries('external', 'RFS', pin, 0.1))).toEqual({ virtualCondition: null, resultantCondition: null, innerBoundary: 9.7, outerBoundary: 10.1 });
  });

  // reference.md §4 inch example [C]: hole .073–.077, position .005 at LMC → outer .082, inner .064.
  it('inch hole .073–.077, position .005 at LMC: outer .082, inner .064', () => {
    const boundaries = featureBoundaries('internal', 'LMC', materialConditionSizes('internal', 0.073, 0.077), 0.005);
    expect(roundTo(boundaries.outerBoundary, 6)).toBe(0.082);
    expect(roundTo(boundaries.innerBoundary, 6)).toBe(0.064);
  });
});
