import type { LengthUnit } from '@limitbook/contracts';
import { sizeSeries } from '../boundary/size-series.js';
import { roundLength } from '../core/units.js';
import { wallAtSizes, type WallAtSizes, type WallModel } from './wall-at-sizes.js';

export interface WallSweep {
  /** Produced sizes of the located feature, ascending. */
  featureSizes: number[];
  /** One series per produced datum size (one series with a null size for a plane datum). */
  series: { datumSize: number | null; minWall: number[]; maxWall: number[] }[];
}

export interface WallExtremes {
  thinnest: WallAtSizes;
  thickest: WallAtSizes;
  /** Smallest and largest of the per-size thinnest walls over the grid: equal when the minimum wall does not depend on size. */
  thinnestRange: { low: number; high: number };
  gridSize: { featureSizes: number; datumSizes: number };
  sweep: WallSweep;
}

/**
 * Searches a grid over both size ranges (each from LMC to MMC, limits included) for the thinnest
 * and thickest wall. The wall is linear in each size between its limits, so a grid that includes
 * both limits finds the true extremes; its interior points feed the chart. Ties keep the first
 * pair found, nearest LMC, so a size-independent minimum is reported at the LMC pair.
 */
export function wallExtremes(model: WallModel, unit: LengthUnit): WallExtremes {
  const featureSizes = sizeSeries(model.feature.lmcSize, model.feature.mmcSize, unit);
  const datumSizes: (number | null)[] = model.datum === null ? [null] : sizeSeries(model.datum.lmcSize, model.datum.mmcSize, unit);
  let thinnest: WallAtSizes | undefined;
  let thickest: WallAtSizes | undefined;
  let high = -Infinity;
  const wallsByDatum = new Map<number | null, Map<number, WallAtSizes>>();
  for (const datumSize of datumSizes) {
    const row = new Map<number, WallAtSizes>();
    wallsByDatum.set(datumSize, row);
    for (const featureSize of featureSizes) {
      const wall = wallAtSizes(model, featureSize, datumSize);
      row.set(featureSize, wall);
      // Compare at display resolution so float noise cannot move the reported location between equal walls.
      if (thinnest === undefined || roundLength(wall.thinnest, unit) < roundLength(thinnest.thinnest, unit)) thinnest = wall;
      if (thickest === undefined || roundLength(wall.thickest, unit) > roundLength(thickest.thickest, unit)) thickest = wall;
      high = Math.max(high, wall.thinnest);
    }
  }
  const ascendingFeature = [...featureSizes].sort((a, b) => a - b);
  const ascendingDatum = [...datumSizes].sort((a, b) => (a ?? 0) - (b ?? 0));
  const sweep: WallSweep = {
    featureSizes: ascendingFeature.map((size) => roundLength(size, unit)),
    series: ascendingDatum.map((datumSize) => {
      const row = wallsByDatum.get(datumSize)!;
      return {
        datumSize: datumSize === null ? null : roundLength(datumSize, unit),
        minWall: ascendingFeature.map((size) => roundLength(row.get(size)!.thinnest, unit)),
        maxWall: ascendingFeature.map((size) => roundLength(row.get(size)!.thickest, unit)),
      };
    }),
  };
  return {
    thinnest: thinnest!,
    thickest: thickest!,
    thinnestRange: { low: thinnest!.thinnest, high },
    gridSize: { featureSizes: featureSizes.length, datumSizes: datumSizes.length },
    sweep,
  };
}
