import type { StackPlan } from './stack-plan.js';

export interface StackRange {
  min: number;
  max: number;
  /** Half-width of the range about the centred mean. */
  tolerance: number;
}

export interface StackClosedForms {
  /** Σ sᵢ·nᵢ. */
  nominal: number;
  /** Σ sᵢ·cᵢ, the mean once every contributor is centred in its limits. */
  mean: number;
  meanShift: number;
  worstCase: StackRange;
  rss: StackRange;
  inflatedRss: StackRange;
  /** √Σσᵢ² from each contributor's stated distribution: what the Monte Carlo σ estimates. */
  sigma: number;
  /** Share of each contributor in Σtᵢ², in percent. */
  contributions: { name: string; percent: number }[];
}

/** Bender's inflation of RSS for real processes (SAE 680490). */
export const rssInflationFactor = 1.5;

/** Worst case Σ|sᵢ|tᵢ and RSS √Σ(sᵢtᵢ)² about the centred mean, with tᵢ half of each contributor's band. */
export function stackClosedForms(plan: StackPlan): StackClosedForms {
  let nominal = 0;
  let mean = 0;
  let worstCaseTolerance = 0;
  let sumOfSquares = 0;
  let variance = 0;
  for (const contributor of plan.contributors) {
    nominal += contributor.sense * contributor.nominal;
    mean += contributor.sense * contributor.centre;
    worstCaseTolerance += contributor.halfBand;
    sumOfSquares += contributor.halfBand ** 2;
    variance += contributor.sigma ** 2;
  }
  const rssTolerance = Math.sqrt(sumOfSquares);
  const range = (tolerance: number): StackRange => ({ min: mean - tolerance, max: mean + tolerance, tolerance });
  return {
    nominal,
    mean,
    meanShift: mean - nominal,
    worstCase: range(worstCaseTolerance),
    rss: range(rssTolerance),
    inflatedRss: range(rssInflationFactor * rssTolerance),
    sigma: Math.sqrt(variance),
    contributions: plan.contributors.map((contributor) => ({
      name: contributor.name,
      percent: sumOfSquares > 0 ? (100 * contributor.halfBand ** 2) / sumOfSquares : 0,
    })),
  };
}
