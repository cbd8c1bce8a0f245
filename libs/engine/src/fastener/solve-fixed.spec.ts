import { describe, expect, it } from 'vitest';
import { roundTo } from '../core/units.js';
import { solveFixed } from './solve-fixed.js';

const r = (value: number) => roundTo(value, 6);

describe('solveFixed', () => {
  // T = (H − F)/2 with a projected zone (reference.md §6 [C]); M10 numbers derived there [D].
  it('splits the clearance equally: M10, H 10.5, F 10.0 → T1 = T2 = 0.25', () => {
    const solution = solveFixed({ holeSize: 10.5, fastenerSize: 10 });
    expect([r(solution.positionTolerance), r(solution.toleranceThreaded), solution.equalSplit, solution.projectionFactor]).toEqual([0.25, 0.25, true, 1]);
  });

  // H = F + T1 + T2 (reference.md §6 [C]); T1 = 0.2 with T2 = 0.3 derived there [D].
  it('takes an unequal split: T2 = 0.3 leaves T1 = 0.2, and T1 0.2 with T2 0.3 needs H 10.5', () => {
    expect(r(solveFixed({ holeSize: 10.5, fastenerSize: 10, toleranceThreaded: 0.3 }).positionTolerance)).toBe(0.2);
    expect(r(solveFixed({ fastenerSize: 10, positionTolerance: 0.2, toleranceThreaded: 0.3 }).holeSize)).toBe(10.5);
    expect(r(solveFixed({ holeSize: 10.5, positionTolerance: 0.2, toleranceThreaded: 0.3 }).fastenerSize)).toBe(10);
  });

  // H = F + T1 + T2(1 + 2P/D): inputs from reference.md §6 [C], printed form from memory [M].
  it('counts the fixed part 1 + 2P/D times without a projected zone', () => {
    // P = 12, D = 15: k = 1 + 24/15 = 2.6; H = 10 + 0.2 + 2.6 × 0.2 = 10.72.
    const solution = solveFixed({ fastenerSize: 10, positionTolerance: 0.2, projection: 12, engagementDepth: 15 });
    expect([r(solution.projectionFactor), r(solution.toleranceThreaded), r(solution.holeSize)]).toEqual([2.6, 0.2, 10.72]);
    // Equal split without the projected zone: T = (H − F)/(1 + k) = 0.72/3.6 = 0.2.
    expect(r(solveFixed({ holeSize: 10.72, fastenerSize: 10, projection: 12, engagementDepth: 15 }).positionTolerance)).toBe(0.2);
  });

  // Tabs in slots with equal MMC: T1 = T2 = 0 at MMC, all tolerance from bonus (reference.md §6 [C]).
  it('gives zero tolerance at MMC when hole and fastener MMC are equal', () => {
    const solution = solveFixed({ holeSize: 6, fastenerSize: 6 });
    expect([solution.positionTolerance, solution.toleranceThreaded]).toEqual([0, 0]);
  });

  it('refuses a fixed-part tolerance larger than the clearance, and a hole smaller than the fastener', () => {
    expect(() => solveFixed({ holeSize: 10.5, fastenerSize: 10, toleranceThreaded: 0.6 })).toThrow(/negative tolerance/);
    expect(() => solveFixed({ holeSize: 9.9, fastenerSize: 10 })).toThrow(/smaller than the fastener/);
    expect(() => solveFixed({ holeSize: 1, positionTolerance: 0.5 })).toThrow(/no fastener fits/);
  });
});
