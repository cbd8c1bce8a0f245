import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createRandomStream } from './random-stream.js';

describe('createRandomStream', () => {
  it('repeats exactly for the same seed and differs for another', () => {
    const first = createRandomStream(42);
    const again = createRandomStream(42);
    const other = createRandomStream(43);
    const a = Array.from({ length: 5 }, first);
    expect(Array.from({ length: 5 }, again)).toEqual(a);
    expect(Array.from({ length: 5 }, other)).not.toEqual(a);
  });

  it('stays in [0, 1) for any 32-bit seed, including 0', () => {
    fc.assert(
      fc.property(fc.nat({ max: 0xffffffff }), (seed) => {
        const next = createRandomStream(seed);
        for (let i = 0; i < 200; i += 1) {
          const value = next();
          if (!(value >= 0 && value < 1)) return false;
        }
        return true;
      }),
      { numRuns: 50 },
    );
  });

  it('is uniform: mean 1/2 and variance 1/12 within sampling error (common practice)', () => {
    const next = createRandomStream(7);
    const n = 200_000;
    let sum = 0;
    let sumSquares = 0;
    const deciles = new Array<number>(10).fill(0);
    for (let i = 0; i < n; i += 1) {
      const value = next();
      sum += value;
      sumSquares += value * value;
      deciles[Math.floor(value * 10)]! += 1;
    }
    const mean = sum / n;
    const variance = sumSquares / n - mean * mean;
    // Standard error of the mean is √(1/12/n) ≈ 0.00065; allow five of them.
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.0033);
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.001);
    // Each decile holds n/10 ± a few √(n/10·0.9) ≈ 134.
    for (const count of deciles) expect(Math.abs(count - n / 10)).toBeLessThan(700);
  });
});
