import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { runMonteCarlo } from './run-monte-carlo.js';
import { stackClosedForms } from './stack-closed-forms.js';
import { planStack } from './stack-plan.js';
import { gapStack, randomContributors, withDistribution } from './stack-test-data.js';

const trials = 400_000;
// Relative standard error of a sample σ is about 1/√(2N) (reference §7); allow four of them.
const sigmaTolerance = 4 / Math.sqrt(2 * trials);

describe('runMonteCarlo', () => {
  it('gives σ = RSS/3 for normal contributors with σᵢ = tᵢ/3 (reference §7: 0.04203)', () => {
    const summary = runMonteCarlo(planStack(gapStack), trials, 1);
    expect(Math.abs(summary.stdDev / 0.04203 - 1)).toBeLessThan(sigmaTolerance);
    // Standard error of the mean is σ/√N ≈ 0.00007; allow five.
    expect(Math.abs(summary.mean - 3)).toBeLessThan(5 * (0.042 / Math.sqrt(trials)));
    expect(summary.trials).toBe(trials);
    expect(summary.histogram.reduce((sum, bin) => sum + bin.count, 0)).toBe(trials);
  });

  it('gives σ = RSS/√3 for uniform contributors (reference §7: theory 0.07280) and stays inside the worst case', () => {
    const summary = runMonteCarlo(planStack(withDistribution('uniform')), trials, 2);
    expect(Math.abs(summary.stdDev / 0.0728 - 1)).toBeLessThan(sigmaTolerance);
    expect(summary.min).toBeGreaterThanOrEqual(2.77);
    expect(summary.max).toBeLessThanOrEqual(3.23);
  });

  it('gives σ = RSS/√6 for symmetric triangular contributors (variance of a triangular distribution, t²/6)', () => {
    const expected = stackClosedForms(planStack(withDistribution('triangular'))).sigma;
    expect(expected).toBeCloseTo(0.1261 / Math.sqrt(6), 4);
    const summary = runMonteCarlo(planStack(withDistribution('triangular')), trials, 3);
    expect(Math.abs(summary.stdDev / expected - 1)).toBeLessThan(sigmaTolerance);
  });

  it('counts trials beyond the spec limits close to the normal model (Cpk 1 → 1350 ppm a side, reference §7)', () => {
    const plan = { ...planStack(gapStack), lowerSpec: 3 - 0.1261, upperSpec: 3 + 0.1261 };
    const summary = runMonteCarlo(plan, trials, 4);
    // Expected count 540 a side, Poisson σ ≈ 23; allow five.
    const expected = 0.00135 * trials;
    expect(Math.abs(summary.countBelow - expected)).toBeLessThan(5 * Math.sqrt(expected));
    expect(Math.abs(summary.countAbove - expected)).toBeLessThan(5 * Math.sqrt(expected));
  });

  it('repeats exactly with the same seed and differs with another', () => {
    const plan = planStack(withDistribution('triangular'));
    expect(runMonteCarlo(plan, 5_000, 9)).toEqual(runMonteCarlo(plan, 5_000, 9));
    expect(runMonteCarlo(plan, 5_000, 10).mean).not.toBe(runMonteCarlo(plan, 5_000, 9).mean);
  });

  it('refuses trial counts beyond the limit with LIMIT_EXCEEDED', () => {
    const plan = planStack(gapStack);
    expect(() => runMonteCarlo(plan, 2_000_001, 1)).toThrow(EngineError);
    expect(() => runMonteCarlo(plan, 1.5, 1)).toThrow(/whole number/);
    const wide = planStack({ contributors: Array.from({ length: 100 }, () => gapStack.contributors[0]!) });
    expect(() => runMonteCarlo(wide, 1_000_000, 1)).toThrow(expect.objectContaining({ code: 'LIMIT_EXCEEDED' }));
  });

  it('property: the sample σ converges to the RSS-based σ for normal contributors', () => {
    const n = 20_000;
    fc.assert(
      fc.property(randomContributors, fc.nat({ max: 0xffffffff }), (contributors, seed) => {
        const normal = contributors.map((c) => ({ ...c, distribution: 'normal' as const }));
        const plan = planStack({ contributors: normal });
        const rssSigma = stackClosedForms(plan).rss.tolerance / 3;
        fc.pre(rssSigma > 0);
        const summary = runMonteCarlo(plan, n, seed);
        return Math.abs(summary.stdDev / rssSigma - 1) < 5 / Math.sqrt(2 * n);
      }),
      { numRuns: 25 },
    );
  });

  it('property: reversing every sense mirrors the samples exactly for the same seed', () => {
    fc.assert(
      fc.property(randomContributors, fc.nat({ max: 0xffffffff }), (contributors, seed) => {
        const forward = runMonteCarlo(planStack({ contributors }), 2_000, seed);
        const reversed = runMonteCarlo(planStack({ contributors: contributors.map((c) => ({ ...c, sense: c.sense === 1 ? -1 : 1 }) as const) }), 2_000, seed);
        const close = (a: number, b: number) => Math.abs(a - b) < 1e-9 * (1 + Math.abs(a));
        return close(forward.mean, -reversed.mean) && close(forward.min, -reversed.max) && close(forward.stdDev, reversed.stdDev);
      }),
      { numRuns: 25 },
    );
  });
});
