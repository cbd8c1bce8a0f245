import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { roundTo } from '../core/units.js';
import { solveFloating } from './solve-floating.js';

describe('solveFloating', () => {
  // T = H − F (ASME Y14.5 nonmandatory appendix, floating fastener; reference.md §6 [C]);
  // M10 numbers F = 10.0, H = 10.5 derived in reference.md §6 [D].
  it('solves the position tolerance: M10, H 10.5, F 10.0 → T 0.5', () => {
    const solution = solveFloating({ holeSize: 10.5, fastenerSize: 10 });
    expect(solution.solvedFor).toBe('positionTolerance');
    expect(roundTo(solution.positionTolerance, 6)).toBe(0.5);
  });

  it('solves the hole size and the fastener size from the same relation', () => {
    expect(roundTo(solveFloating({ fastenerSize: 10, positionTolerance: 0.5 }).holeSize, 6)).toBe(10.5);
    expect(roundTo(solveFloating({ holeSize: 10.5, positionTolerance: 0.5, fastenerSize: null }).fastenerSize, 6)).toBe(10);
  });

  it('refuses a hole smaller than the fastener instead of returning a negative tolerance', () => {
    expect(() => solveFloating({ holeSize: 9.8, fastenerSize: 10 })).toThrow(EngineError);
    try {
      solveFloating({ holeSize: 9.8, fastenerSize: 10 });
    } catch (error) {
      expect((error as EngineError).fields).toEqual({ holeSize: 'The clearance hole at MMC is smaller than the fastener at MMC: no position tolerance remains' });
    }
  });

  it('refuses a tolerance that leaves no room for a fastener', () => {
    expect(() => solveFloating({ holeSize: 1, positionTolerance: 1 })).toThrow(/no fastener fits/);
  });
});
