import { maxStackSamples, maxStackTrials } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { createRandomStream } from './random-stream.js';
import type { PlannedContributor, StackPlan } from './stack-plan.js';

export interface HistogramBin {
  from: number;
  to: number;
  count: number;
}

export interface MonteCarloSummary {
  trials: number;
  seed: number;
  mean: number;
  /** Sample standard deviation (n − 1). */
  stdDev: number;
  min: number;
  max: number;
  countBelow: number;
  countAbove: number;
  histogram: HistogramBin[];
}

export const histogramBinCount = 50;

/**
 * Samples the stack `trials` times from a seeded stream: plain data in and out, no clock and
 * no shared state, so a server can post it to a worker thread. Sums are accumulated contributor
 * by contributor into one Float64Array, with no allocation per trial.
 */
export function runMonteCarlo(plan: StackPlan, trials: number, seed: number): MonteCarloSummary {
  if (!Number.isInteger(trials) || trials < 2 || trials > maxStackTrials) {
    throw new EngineError('LIMIT_EXCEEDED', `Trials must be a whole number from 2 to ${maxStackTrials}`, { trials: 'Trials out of range' });
  }
  if (trials * plan.contributors.length > maxStackSamples) {
    throw new EngineError('LIMIT_EXCEEDED', 'Too many trials for this many contributors', { trials: 'Too many trials for this many contributors' });
  }
  const next = createRandomStream(seed);
  // Deviations from the centred mean are summed, and the mean added once, to keep precision.
  const deviations = new Float64Array(trials);
  let centredMean = 0;
  for (const contributor of plan.contributors) {
    centredMean += contributor.sense * contributor.centre;
    addContributor(deviations, contributor, next);
  }

  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < trials; i += 1) {
    const value = deviations[i]!;
    sum += value;
    if (value < min) min = value;
    if (value > max) max = value;
  }
  const meanDeviation = sum / trials;
  let squares = 0;
  for (let i = 0; i < trials; i += 1) squares += (deviations[i]! - meanDeviation) ** 2;

  const below = plan.lowerSpec === undefined ? -Infinity : plan.lowerSpec - centredMean;
  const above = plan.upperSpec === undefined ? Infinity : plan.upperSpec - centredMean;
  const counts = new Float64Array(histogramBinCount);
  const width = (max - min) / histogramBinCount;
  let countBelow = 0;
  let countAbove = 0;
  for (let i = 0; i < trials; i += 1) {
    const value = deviations[i]!;
    if (value < below) countBelow += 1;
    else if (value > above) countAbove += 1;
    const bin = width > 0 ? Math.min(histogramBinCount - 1, Math.floor((value - min) / width)) : 0;
    counts[bin]! += 1;
  }

  return {
    trials,
    seed,
    mean: centredMean + meanDeviation,
    stdDev: Math.sqrt(squares / (trials - 1)),
    min: centredMean + min,
    max: centredMean + max,
    countBelow,
    countAbove,
    histogram: Array.from(counts, (count, bin) => ({
      from: centredMean + min + bin * width,
      to: centredMean + min + (bin + 1) * width,
      count,
    })),
  };
}

function addContributor(deviations: Float64Array, contributor: PlannedContributor, next: () => number): void {
  const trials = deviations.length;
  const { sense, halfBand, sigma } = contributor;
  switch (contributor.distribution) {
    case 'normal': {
      if (sigma === 0) return;
      const scale = sense * sigma;
      // Marsaglia's polar method: two normal deviates per accepted pair, no trigonometry.
      for (let i = 0; i < trials; i += 2) {
        let u: number;
        let v: number;
        let s: number;
        do {
          u = 2 * next() - 1;
          v = 2 * next() - 1;
          s = u * u + v * v;
        } while (s >= 1 || s === 0);
        const factor = scale * Math.sqrt((-2 * Math.log(s)) / s);
        deviations[i]! += u * factor;
        if (i + 1 < trials) deviations[i + 1]! += v * factor;
      }
      return;
    }
    case 'uniform': {
      const scale = sense * halfBand;
      for (let i = 0; i < trials; i += 1) deviations[i]! += scale * (2 * next() - 1);
      return;
    }
    case 'triangular': {
      // The sum of two uniforms is triangular on [−1, 1] with its mode at 0.
      const scale = sense * halfBand;
      for (let i = 0; i < trials; i += 1) deviations[i]! += scale * (next() + next() - 1);
      return;
    }
  }
}
