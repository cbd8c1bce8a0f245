import { describe, expect, it } from 'vitest';
import { normalTailProbability } from './normal-tail-probability.js';

const ppm = (z: number) => normalTailProbability(z) * 1e6;

describe('normalTailProbability', () => {
  it('gives the one-sided ppm of a centred normal at the usual Cpk values', () => {
    // Limitbook reference §7 (normal-model ppm): Cpk 1 → 1350, 4/3 → 31.7, 1.5 → 3.40, 5/3 → 0.287, 2 → 0.00099.
    expect(ppm(3)).toBeCloseTo(1349.9, 0);
    expect(ppm(4)).toBeCloseTo(31.67, 1);
    expect(ppm(4.5)).toBeCloseTo(3.398, 2);
    expect(ppm(5)).toBeCloseTo(0.2867, 3);
    expect(ppm(6) / 0.000987).toBeCloseTo(1, 2);
  });

  it('is one half at zero and symmetric: Q(−z) = 1 − Q(z) (definition of the normal distribution)', () => {
    expect(normalTailProbability(0)).toBeCloseTo(0.5, 7);
    expect(normalTailProbability(-1.5) + normalTailProbability(1.5)).toBeCloseTo(1, 7);
    // 1 − Φ(1.96) = 0.025 (any statistics table).
    expect(normalTailProbability(1.96)).toBeCloseTo(0.025, 4);
  });
});
