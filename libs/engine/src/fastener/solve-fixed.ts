import type { FastenerFixedInput, FastenerQuantity } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { unknownQuantity } from './unknown-quantity.js';

export interface FixedSolution {
  solvedFor: FastenerQuantity;
  holeSize: number;
  fastenerSize: number;
  /** T1, the clearance-hole part. */
  positionTolerance: number;
  /** T2, the fixed (threaded or press-fit) part. */
  toleranceThreaded: number;
  /** True when T2 was not given and equals T1. */
  equalSplit: boolean;
  /** 1 with a projected tolerance zone on the fixed part, 1 + 2P/D without one. */
  projectionFactor: number;
}

/**
 * Fixed fastener: H = F + T1 + k·T2 with k = 1 where the fixed part carries a projected tolerance
 * zone and k = 1 + 2P/D where it does not (the fastener's tilt within the engagement depth D
 * carries to the top of the projection P). T2 defaults to T1.
 */
export function solveFixed(inputs: FastenerFixedInput): FixedSolution {
  const solvedFor = unknownQuantity(inputs);
  const projectionFactor =
    typeof inputs.projection === 'number' && typeof inputs.engagementDepth === 'number' ? 1 + (2 * inputs.projection) / inputs.engagementDepth : 1;
  const givenThreaded = typeof inputs.toleranceThreaded === 'number' ? inputs.toleranceThreaded : undefined;
  const equalSplit = givenThreaded === undefined;
  const { holeSize: H, fastenerSize: F, positionTolerance: T1 } = inputs;
  const solution = (holeSize: number, fastenerSize: number, positionTolerance: number): FixedSolution => ({
    solvedFor,
    holeSize,
    fastenerSize,
    positionTolerance,
    toleranceThreaded: givenThreaded ?? positionTolerance,
    equalSplit,
    projectionFactor,
  });
  switch (solvedFor) {
    case 'positionTolerance': {
      const clearance = (H as number) - (F as number);
      if (clearance < 0) {
        throw EngineError.invalid({ holeSize: 'The clearance hole at MMC is smaller than the fastener at MMC: no position tolerance remains' });
      }
      if (givenThreaded === undefined) return solution(H as number, F as number, clearance / (1 + projectionFactor));
      const tolerance = clearance - projectionFactor * givenThreaded;
      if (tolerance < 0) {
        throw EngineError.invalid({ toleranceThreaded: 'The fixed part’s tolerance uses up more than the whole clearance: the clearance-hole part would need a negative tolerance' });
      }
      return solution(H as number, F as number, tolerance);
    }
    case 'holeSize': {
      const threaded = givenThreaded ?? (T1 as number);
      return solution((F as number) + (T1 as number) + projectionFactor * threaded, F as number, T1 as number);
    }
    case 'fastenerSize': {
      const threaded = givenThreaded ?? (T1 as number);
      const fastener = (H as number) - (T1 as number) - projectionFactor * threaded;
      if (fastener <= 0) throw EngineError.invalid({ positionTolerance: 'The tolerances take up the whole hole: no fastener fits' });
      return solution(H as number, fastener, T1 as number);
    }
  }
}
