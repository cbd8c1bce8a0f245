import { describe, expect, it } from 'vitest';
import { materialConditionSizes } from '../boundary/material-condition-sizes.js';
import { roundTo } from '../core/units.js';
import type { WallModel } from './wall-at-sizes.js';
import { wallExtremes } from './wall-extremes.js';

const coaxial = (toleranceModifier: WallModel['toleranceModifier'], datumModifier: WallModel['datumModifier']): WallModel => ({
  geometry: { kind: 'inside', basicDistance: 0, outer: 'datum' },
  feature: materialConditionSizes('internal', 19.9, 20.1),
  datum: materialConditionSizes('external', 29.9, 30.1),
  positionTolerance: 0.2,
  toleranceModifier,
  datumModifier,
});

describe('wallExtremes', () => {
  // reference.md §5 [D]: boss Ø30 ±0.1, bore Ø20 ±0.1, position Ø0.2.
  it('finds the RFS minimum 4.80 at the LMC sizes and 5.00 at the MMC sizes', () => {
    const extremes = wallExtremes(coaxial('RFS', 'RMB'), 'mm');
    expect(roundTo(extremes.thinnest.thinnest, 6)).toBe(4.8);
    expect([extremes.thinnest.featureSize, extremes.thinnest.datumSize]).toEqual([20.1, 29.9]);
    expect(roundTo(extremes.thinnestRange.high, 6)).toBe(5);
  });

  it('sweeps ascending feature sizes with one series per datum size', () => {
    const { sweep, gridSize } = wallExtremes(coaxial('MMC', 'MMB'), 'mm');
    expect(gridSize).toEqual({ featureSizes: 11, datumSizes: 11 });
    expect(sweep.featureSizes[0]).toBe(19.9);
    expect(sweep.featureSizes.at(-1)).toBe(20.1);
    expect(sweep.series.map((series) => series.datumSize)).toEqual([29.9, 29.92, 29.94, 29.96, 29.98, 30, 30.02, 30.04, 30.06, 30.08, 30.1]);
    // At the smallest boss (most datum shift) and the largest bore (most bonus) the wall is thinnest: 4.60.
    expect(sweep.series[0]!.minWall.at(-1)).toBe(4.6);
    // At MMC of both nothing is gained: (30.1 − 19.9)/2 − 0.1 = 5.00.
    expect(sweep.series.at(-1)!.minWall[0]).toBe(5);
  });

  it('reports a size-independent minimum at the LMC pair', () => {
    const extremes = wallExtremes(coaxial('LMC', 'LMB'), 'mm');
    expect(roundTo(extremes.thinnestRange.high - extremes.thinnestRange.low, 9)).toBe(0);
    expect([extremes.thinnest.featureSize, extremes.thinnest.datumSize]).toEqual([20.1, 29.9]);
  });
});
