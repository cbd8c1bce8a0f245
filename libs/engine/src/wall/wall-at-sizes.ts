import type { DatumModifier, ToleranceModifier } from '@limitbook/contracts';
import { bonusTolerance } from '../boundary/bonus-tolerance.js';
import type { MaterialConditionSizes } from '../boundary/material-condition-sizes.js';
import { datumFeatureShift } from './datum-feature-shift.js';
import { wallAtOffset } from './wall-at-offset.js';
import type { WallGeometry } from './wall-geometry.js';

export interface WallModel {
  geometry: WallGeometry;
  feature: MaterialConditionSizes;
  /** Null for a plane datum, which has no size. */
  datum: MaterialConditionSizes | null;
  positionTolerance: number;
  toleranceModifier: ToleranceModifier;
  datumModifier: DatumModifier;
}

export interface WallAtSizes {
  featureSize: number;
  datumSize: number | null;
  bonus: number;
  datumShift: number;
  /** t + bonus + datum shift: the diameter within which the feature axis may lie about the datum feature's own axis. */
  positionAllowance: number;
  /** Largest offset of the feature axis from its basic location along the line of centres: half the allowance. */
  offsetAllowance: number;
  thinnest: number;
  thickest: number;
  /** Offset along the line of centres (positive away from the datum) at which the thinnest wall occurs. */
  offsetAtThinnest: number;
}

/** Thinnest and thickest wall for one pair of produced sizes, over every offset the position zone allows. */
export function wallAtSizes(model: WallModel, featureSize: number, datumSize: number | null): WallAtSizes {
  const bonus = bonusTolerance(featureSize, model.toleranceModifier, model.feature);
  const datumShift = model.datum === null || datumSize === null ? 0 : datumFeatureShift(datumSize, model.datumModifier, model.datum);
  const positionAllowance = model.positionTolerance + bonus + datumShift;
  const offsetAllowance = positionAllowance / 2;
  const wallAt = (offset: number) => wallAtOffset(model.geometry, featureSize, datumSize ?? 0, offset);
  // The wall is linear in the offset, so the ends of the allowed offsets bound it; compare both rather than presume the side.
  const candidates = [-offsetAllowance, offsetAllowance].map((offset) => ({ offset, wall: wallAt(offset) }));
  const [low, high] = candidates[0]!.wall <= candidates[1]!.wall ? [candidates[0]!, candidates[1]!] : [candidates[1]!, candidates[0]!];
  return {
    featureSize,
    datumSize,
    bonus,
    datumShift,
    positionAllowance,
    offsetAllowance,
    thinnest: low.wall,
    thickest: high.wall,
    offsetAtThinnest: low.offset,
  };
}
