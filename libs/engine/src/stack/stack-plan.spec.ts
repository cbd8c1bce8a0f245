import { describe, expect, it } from 'vitest';
import { planStack } from './stack-plan.js';

describe('planStack', () => {
  it('centres an unequal tolerance in its limits (common practice)', () => {
    // 10 +0.1/−0: limits 10 … 10.1, centred 10.05 ± 0.05.
    const [shaft] = planStack({ contributors: [{ name: 'shaft', sense: 1, nominal: 10, plusTol: 0.1, minusTol: 0, distribution: 'normal' }] }).contributors;
    expect(shaft!.centre).toBeCloseTo(10.05, 12);
    expect(shaft!.halfBand).toBeCloseTo(0.05, 12);
    expect(shaft!.sigma).toBeCloseTo(0.05 / 3, 12);
  });

  it('gives σ per distribution: normal t/(3·Cpk) or stated, uniform t/√3, triangular t/√6 (reference §7; standard moments)', () => {
    const sigmas = planStack({
      contributors: [
        { name: 'a', sense: 1, nominal: 1, plusTol: 0.3, minusTol: 0.3, distribution: 'normal' },
        { name: 'b', sense: 1, nominal: 1, plusTol: 0.3, minusTol: 0.3, distribution: 'normal', cpk: 1.5 },
        { name: 'c', sense: 1, nominal: 1, plusTol: 0.3, minusTol: 0.3, distribution: 'normal', sigma: 0.02 },
        { name: 'd', sense: 1, nominal: 1, plusTol: 0.3, minusTol: 0.3, distribution: 'uniform' },
        { name: 'e', sense: 1, nominal: 1, plusTol: 0.3, minusTol: 0.3, distribution: 'triangular' },
      ],
    }).contributors.map((contributor) => contributor.sigma);
    expect(sigmas[0]).toBeCloseTo(0.1, 12);
    expect(sigmas[1]).toBeCloseTo(0.3 / 4.5, 12);
    expect(sigmas[2]).toBe(0.02);
    expect(sigmas[3]).toBeCloseTo(0.3 / Math.sqrt(3), 12);
    expect(sigmas[4]).toBeCloseTo(0.3 / Math.sqrt(6), 12);
  });
});
