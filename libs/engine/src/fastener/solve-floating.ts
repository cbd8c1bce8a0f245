import type { FastenerFloatingInput, FastenerQuantity } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { unknownQuantity } from './unknown-quantity.js';

export interface FloatingSolution {
  solvedFor: FastenerQuantity;
  holeSize: number;
  fastenerSize: number;
  positionTolerance: number;
}

/**
 * Floating fastener: both parts have clearance holes, so each part may use the whole clearance
 * at MMC as its position tolerance: T = H − F.
 */
export function solveFloating(inputs: FastenerFloatingInput): FloatingSolution {
  const solvedFor = unknownQuantity(inputs);
  const { holeSize: H, fastenerSize: F, positionTolerance: T } = inputs;
  switch (solvedFor) {
    case 'positionTolerance': {
      const tolerance = (H as number) - (F as number);
      if (tolerance < 0) {
        throw EngineError.invalid({ holeSize: 'The clearance hole at MMC is smaller than the fastener at MMC: no position tolerance remains' });
      }
      return { solvedFor, holeSize: H as number, fastenerSize: F as number, positionTolerance: tolerance };
    }
    case 'holeSize':
      return { solvedFor, holeSize: (F as number) + (T as number), fastenerSize: F as number, positionTolerance: T as number };
    case 'fastenerSize': {
      const fastener = (H as number) - (T as number);
      if (fastener <= 0) throw EngineError.invalid({ positionTolerance: 'The position tolerance is as large as the hole: no fastener fits' });
      return { solvedFor, holeSize: H as number, fastenerSize: fastener, positionTolerance: T as number };
    }
  }
}
