import type { LengthUnit } from '@limitbook/contracts';
import { lengthDecimals, roundLength } from '../core/units.js';

const niceMantissas = [1, 2, 2.5, 5];

/**
 * Sizes from `from` to `to`, both included exactly, at a round step (1, 2, 2.5 or 5 × 10ⁿ) that gives at
 * most `maxIntervals` intervals; the last interval is shorter when the range is not a multiple of
 * the step. Interior sizes are rounded to the unit's display resolution, which the step never goes below.
 */
export function sizeSeries(from: number, to: number, unit: LengthUnit, maxIntervals = 10): number[] {
  const span = Math.abs(to - from);
  const resolution = 10 ** -lengthDecimals[unit];
  if (roundLength(span, unit) === 0) return [from];
  const direction = Math.sign(to - from);
  const step = niceStep(span / maxIntervals, resolution);
  const series: number[] = [];
  // Count in whole steps so no float error accumulates along the series.
  for (let index = 1; index * step < span - resolution / 2; index += 1) {
    series.push(roundLength(from + direction * index * step, unit));
  }
  // The limits stay exact (an inch conversion of a metric limit has more digits than the display keeps).
  return [from, ...series, to];
}

function niceStep(minimum: number, resolution: number): number {
  let exponent = Math.floor(Math.log10(minimum)) - 1;
  for (;;) {
    for (const mantissa of niceMantissas) {
      const step = roundToSignificant(mantissa * 10 ** exponent);
      if (step >= minimum - 1e-12 && step >= resolution - 1e-15) return step;
    }
    exponent += 1;
  }
}

function roundToSignificant(value: number): number {
  return Number(value.toPrecision(6));
}
