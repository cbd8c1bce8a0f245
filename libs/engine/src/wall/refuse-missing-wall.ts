import type { LengthUnit } from '@limitbook/contracts';
import { lengthText } from '../boundary/length-text.js';
import { EngineError } from '../core/engine-error.js';
import { roundLength } from '../core/units.js';
import type { WallAtSizes, WallModel } from './wall-at-sizes.js';

/** Geometry that leaves no wall at the worst case is refused, with the field that can fix it. */
export function refuseMissingWall(model: WallModel, thinnest: WallAtSizes, unit: LengthUnit): void {
  if (roundLength(thinnest.thinnest, unit) > 0) return;
  const { geometry } = model;
  const show = (value: number) => lengthText(value, unit);
  const where = `minimum wall ${show(thinnest.thinnest)} with the feature at ${show(thinnest.featureSize)}${thinnest.datumSize === null ? '' : `, the datum feature at ${show(thinnest.datumSize)}`} and the axis ${show(thinnest.offsetAllowance)} off its basic location`;
  const wallWithoutOffset = thinnest.thinnest + thinnest.offsetAllowance;
  if (geometry.kind === 'between') {
    const needed = geometry.basicDistance - thinnest.thinnest;
    const what = geometry.datumIsPlane ? 'the hole breaks out through the datum face' : 'the features touch or overlap';
    throw EngineError.invalid({ basicDistance: `At worst case ${what} (${where}): the basic distance must exceed ${show(needed)}` });
  }
  if (geometry.basicDistance > 0) {
    const limit = geometry.basicDistance + thinnest.thinnest;
    throw EngineError.invalid({
      basicDistance:
        limit > 0
          ? `At worst case the internal feature breaks out of the external one (${where}): the basic distance must be less than ${show(limit)}`
          : `The internal feature does not fit inside the external one at any basic distance (${where})`,
    });
  }
  if (roundLength(wallWithoutOffset, unit) <= 0) {
    const [key, message] =
      geometry.outer === 'datum'
        ? ['feature.upperLimit', `The located feature at its largest size leaves no wall inside the datum feature at its smallest (${where})`]
        : ['feature.lowerLimit', `The located feature at its smallest size leaves no wall around the datum feature at its largest (${where})`];
    throw EngineError.invalid({ [key]: message });
  }
  throw EngineError.invalid({ positionTolerance: `At worst case the wall breaks through (${where}): reduce the position tolerance or the size ranges` });
}

