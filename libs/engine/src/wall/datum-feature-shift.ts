import type { DatumModifier } from '@limitbook/contracts';
import { bonusTolerance } from '../boundary/bonus-tolerance.js';
import type { MaterialConditionSizes } from '../boundary/material-condition-sizes.js';

/**
 * Datum feature shift allowance (a diameter, like the position zone): the departure of the datum
 * feature's produced size from its MMB or LMB, by which the datum feature may move relative to
 * its simulator. MMB and LMB are taken at the datum feature's MMC and LMC sizes, as for a primary
 * datum feature of size without a geometric tolerance of its own. Zero at RMB. It is not bonus:
 * it moves the whole tolerance zone relative to the datum feature rather than enlarging it.
 */
export function datumFeatureShift(actualSize: number, modifier: DatumModifier, sizes: MaterialConditionSizes): number {
  if (modifier === 'RMB') return 0;
  // The departure from a boundary is measured exactly as bonus is from the matching material condition.
  return bonusTolerance(actualSize, modifier === 'MMB' ? 'MMC' : 'LMC', sizes);
}
