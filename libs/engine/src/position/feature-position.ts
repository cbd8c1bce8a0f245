import type { ToleranceModifier } from '@limitbook/contracts';
import { bonusTolerance } from '../boundary/bonus-tolerance.js';
import type { MaterialConditionSizes } from '../boundary/material-condition-sizes.js';

export interface FeaturePosition {
  dx: number;
  dy: number;
  /** Diameter of the smallest zone centred on true position that holds the measured axis: 2·√(dx² + dy²). */
  deviation: number;
  sizeConforms: boolean;
  /** Departure of the actual size from the stated material condition; zero at RFS and for a feature outside its size limits. */
  bonus: number;
  /** Stated position tolerance plus bonus, a diameter. */
  allowed: number;
  /** Size within limits and axis within the allowed zone around true position, with no datum feature shift. */
  positionConforms: boolean;
}

export interface MeasuredFeature {
  basicX: number;
  basicY: number;
  measuredX: number;
  measuredY: number;
  actualSize: number;
}

/**
 * One measured feature against its position tolerance (ASME Y14.5-2018 position; the deviation
 * as a diameter is the usual conversion of coordinate offsets). `epsilon` absorbs the binary
 * noise of subtracting coordinates, so a feature exactly on a limit is judged on the limit.
 */
export function featurePosition(
  feature: MeasuredFeature,
  sizes: MaterialConditionSizes,
  tolerance: number,
  modifier: ToleranceModifier,
  epsilon: number,
): FeaturePosition {
  const dx = feature.measuredX - feature.basicX;
  const dy = feature.measuredY - feature.basicY;
  const deviation = 2 * Math.hypot(dx, dy);
  const lower = Math.min(sizes.mmcSize, sizes.lmcSize);
  const upper = Math.max(sizes.mmcSize, sizes.lmcSize);
  const sizeConforms = feature.actualSize >= lower - epsilon && feature.actualSize <= upper + epsilon;
  // A feature outside its size limits is rejected on size; it earns no bonus to hide that.
  const bonus = sizeConforms ? bonusTolerance(Math.min(Math.max(feature.actualSize, lower), upper), modifier, sizes) : 0;
  const allowed = tolerance + bonus;
  return { dx, dy, deviation, sizeConforms, bonus, allowed, positionConforms: sizeConforms && deviation <= allowed + epsilon };
}
