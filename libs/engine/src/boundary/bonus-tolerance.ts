import type { ToleranceModifier } from '@limitbook/contracts';
import type { MaterialConditionSizes } from './material-condition-sizes.js';

/**
 * Bonus tolerance at a produced size: its departure from the material condition the tolerance
 * applies at. Zero at RFS. Sizes outside the limits are clamped, so the bonus stays within
 * 0…size tolerance: a part outside its size limits earns no extra tolerance.
 */
export function bonusTolerance(actualSize: number, modifier: ToleranceModifier, sizes: MaterialConditionSizes): number {
  if (modifier === 'RFS') return 0;
  const sizeTolerance = Math.abs(sizes.lmcSize - sizes.mmcSize);
  const from = modifier === 'MMC' ? sizes.mmcSize : sizes.lmcSize;
  const departure = Math.abs(actualSize - from);
  const towardOtherLimit = Math.sign(actualSize - from) === Math.sign((modifier === 'MMC' ? sizes.lmcSize : sizes.mmcSize) - from);
  if (!towardOtherLimit) return 0;
  return Math.min(departure, sizeTolerance);
}
