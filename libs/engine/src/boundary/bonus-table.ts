import type { LengthUnit, ToleranceModifier } from '@limitbook/contracts';
import { roundLength } from '../core/units.js';
import { bonusTolerance } from './bonus-tolerance.js';
import type { MaterialConditionSizes } from './material-condition-sizes.js';
import { sizeSeries } from './size-series.js';

export interface BonusRow {
  actualSize: number;
  bonus: number;
  totalTolerance: number;
}

/**
 * Tolerance available across the size range, starting at the material condition the tolerance
 * applies at (MMC for RFS, where the tolerance is constant) and ending at the opposite limit.
 */
export function bonusTable(modifier: ToleranceModifier, sizes: MaterialConditionSizes, tolerance: number, unit: LengthUnit): BonusRow[] {
  const [from, to] = modifier === 'LMC' ? [sizes.lmcSize, sizes.mmcSize] : [sizes.mmcSize, sizes.lmcSize];
  return sizeSeries(from, to, unit).map((actualSize) => {
    const bonus = bonusTolerance(actualSize, modifier, sizes);
    return {
      actualSize: roundLength(actualSize, unit),
      bonus: roundLength(bonus, unit),
      totalTolerance: roundLength(tolerance + bonus, unit),
    };
  });
}
