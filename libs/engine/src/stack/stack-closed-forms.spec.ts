import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stackClosedForms } from './stack-closed-forms.js';
import { planStack } from './stack-plan.js';
import { gapStack, randomContributors } from './stack-test-data.js';

describe('stackClosedForms', () => {
  it('reproduces the bore/spacer/ring/shoulder gap (reference §7 example)', () => {
    // Reference §7: nominal 3.00, WC ±0.23, RSS ±0.1261, 1.5·RSS ±0.1891.
    const result = stackClosedForms(planStack(gapStack));
    expect(result.nominal).toBeCloseTo(3, 12);
    expect(result.meanShift).toBeCloseTo(0, 12);
    expect(result.worstCase.tolerance).toBeCloseTo(0.23, 12);
    expect(result.worstCase.min).toBeCloseTo(2.77, 12);
    expect(result.worstCase.max).toBeCloseTo(3.23, 12);
    expect(result.rss.tolerance).toBeCloseTo(0.1261, 4);
    expect(result.inflatedRss.tolerance).toBeCloseTo(0.1891, 4);
    // Normal σᵢ = tᵢ/3 makes 3σ of the stack equal RSS (reference §7).
    expect(3 * result.sigma).toBeCloseTo(result.rss.tolerance, 12);
  });

  it('gives each contributor its share of Σtᵢ², summing to 100 % (RSS variance basis, common practice)', () => {
    const result = stackClosedForms(planStack(gapStack));
    const total = 0.1 ** 2 + 0.05 ** 2 + 0.03 ** 2 + 0.05 ** 2;
    expect(result.contributions[0]).toEqual({ name: 'bore depth', percent: expect.closeTo((100 * 0.01) / total, 10) });
    expect(result.contributions.reduce((sum, item) => sum + item.percent, 0)).toBeCloseTo(100, 10);
  });

  it('shifts the mean by half the difference of unequal tolerances, signed by sense (common practice)', () => {
    // Housing 50 +0.2/−0 adds, pin 20 +0/−0.1 subtracts: mean 30 + 0.1 + 0.05 = 30.15, WC ± (0.1 + 0.05).
    const result = stackClosedForms(
      planStack({
        contributors: [
          { name: 'housing', sense: 1, nominal: 50, plusTol: 0.2, minusTol: 0, distribution: 'normal' },
          { name: 'pin', sense: -1, nominal: 20, plusTol: 0, minusTol: 0.1, distribution: 'normal' },
        ],
      }),
    );
    expect(result.nominal).toBeCloseTo(30, 12);
    expect(result.mean).toBeCloseTo(30.15, 12);
    expect(result.meanShift).toBeCloseTo(0.15, 12);
    // Limits combined directly: min 50 − 20 = 30, max 50.2 − 19.9 = 30.3.
    expect(result.worstCase.min).toBeCloseTo(30, 12);
    expect(result.worstCase.max).toBeCloseTo(30.3, 12);
  });

  it('property: worst case ≥ RSS ≥ the largest single contributor', () => {
    fc.assert(
      fc.property(randomContributors, (contributors) => {
        const result = stackClosedForms(planStack({ contributors }));
        const largest = Math.max(...contributors.map((c) => (c.plusTol + c.minusTol) / 2));
        return result.worstCase.tolerance >= result.rss.tolerance - 1e-12 && result.rss.tolerance >= largest - 1e-12;
      }),
      { numRuns: 200 },
    );
  });

  it('property: the worst-case range equals the extreme combination of limits', () => {
    fc.assert(
      fc.property(randomContributors, (contributors) => {
        const result = stackClosedForms(planStack({ contributors }));
        const min = contributors.reduce((sum, c) => sum + (c.sense > 0 ? c.nominal - c.minusTol : -(c.nominal + c.plusTol)), 0);
        const max = contributors.reduce((sum, c) => sum + (c.sense > 0 ? c.nominal + c.plusTol : -(c.nominal - c.minusTol)), 0);
        return Math.abs(result.worstCase.min - min) < 1e-9 && Math.abs(result.worstCase.max - max) < 1e-9;
      }),
      { numRuns: 200 },
    );
  });

  it('property: reversing every sense negates nominal and mean and keeps every tolerance', () => {
    fc.assert(
      fc.property(randomContributors, (contributors) => {
        const forward = stackClosedForms(planStack({ contributors }));
        const reversed = stackClosedForms(planStack({ contributors: contributors.map((c) => ({ ...c, sense: c.sense === 1 ? -1 : 1 }) as const) }));
        return (
          Math.abs(forward.nominal + reversed.nominal) < 1e-9 &&
          Math.abs(forward.mean + reversed.mean) < 1e-9 &&
          forward.worstCase.tolerance === reversed.worstCase.tolerance &&
          forward.rss.tolerance === reversed.rss.tolerance
        );
      }),
      { numRuns: 100 },
    );
  });
});
