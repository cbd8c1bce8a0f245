import type { FeatureType, ToleranceModifier } from '@limitbook/contracts';
import type { MaterialConditionSizes } from './material-condition-sizes.js';

export interface FeatureBoundaries {
  /** Constant boundary from the stated material condition and the tolerance; null at RFS, where it is not defined. */
  virtualCondition: number | null;
  /** The opposite worst-case boundary at MMC or LMC; null at RFS. */
  resultantCondition: number | null;
  innerBoundary: number;
  outerBoundary: number;
}

/**
 * ASME Y14.5 boundaries of a feature of size with a geometric tolerance `tolerance` (a diameter
 * zone) at MMC, LMC or RFS. The inner boundary is the smaller of the two worst-case boundaries.
 */
export function featureBoundaries(
  featureType: FeatureType,
  modifier: ToleranceModifier,
  sizes: MaterialConditionSizes,
  tolerance: number,
): FeatureBoundaries {
  const { mmcSize, lmcSize } = sizes;
  const sizeTolerance = Math.abs(lmcSize - mmcSize);
  // +1 where more material makes the boundary smaller (a hole), −1 where it makes it larger (a pin).
  const outward = featureType === 'internal' ? 1 : -1;
  switch (modifier) {
    case 'MMC': {
      const virtualCondition = mmcSize - outward * tolerance;
      const resultantCondition = lmcSize + outward * (tolerance + sizeTolerance);
      return withInnerOuter(virtualCondition, resultantCondition);
    }
    case 'LMC': {
      const virtualCondition = lmcSize + outward * tolerance;
      const resultantCondition = mmcSize - outward * (tolerance + sizeTolerance);
      return withInnerOuter(virtualCondition, resultantCondition);
    }
    case 'RFS': {
      const mmcSide = mmcSize - outward * tolerance;
      const lmcSide = lmcSize + outward * tolerance;
      return {
        virtualCondition: null,
        resultantCondition: null,
        innerBoundary: Math.min(mmcSide, lmcSide),
        outerBoundary: Math.max(mmcSide, lmcSide),
      };
    }
  }
}

function withInnerOuter(virtualCondition: number, resultantCondition: number): FeatureBoundaries {
  return {
    virtualCondition,
    resultantCondition,
    innerBoundary: Math.min(virtualCondition, resultantCondition),
    outerBoundary: Math.max(virtualCondition, resultantCondition),
  };
}
