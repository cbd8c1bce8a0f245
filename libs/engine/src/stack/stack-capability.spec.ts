import { describe, expect, it } from 'vitest';
import { stackCapability } from './stack-capability.js';

describe('stackCapability', () => {
  it('gives Cp = Cpk = 1 and 2700 ppm for a centred process with limits at ±3σ', () => {
    // Limitbook reference §7: Cp = (USL − LSL)/6σ, Cpk = min(USL − μ, μ − LSL)/3σ; Cpk 1 → 1350 ppm a side, 2700 centred two-sided.
    const capability = stackCapability(3, 0.1, 2.7, 3.3);
    expect(capability.cp).toBeCloseTo(1, 10);
    expect(capability.cpk).toBeCloseTo(1, 10);
    expect(capability.ppmBelow).toBeCloseTo(1350, -1);
    expect(capability.ppmTotal).toBeCloseTo(2700, -1);
  });

  it('gives 63.3 ppm two-sided at Cpk 4/3 and 6.80 at Cpk 1.5 (reference §7)', () => {
    expect(stackCapability(0, 1, -4, 4).ppmTotal).toBeCloseTo(63.3, 1);
    expect(stackCapability(0, 1, -4.5, 4.5).ppmTotal).toBeCloseTo(6.8, 1);
  });

  it('takes Cpk from the nearer limit of an off-centre mean and has no Cp with one limit (definition of Cpk)', () => {
    // μ = 0.5, σ = 1, limits −3 … 3: Cpk = (3 − 0.5)/3, Cp = 1.
    const offCentre = stackCapability(0.5, 1, -3, 3);
    expect(offCentre.cpk).toBeCloseTo(2.5 / 3, 10);
    expect(offCentre.cp).toBeCloseTo(1, 10);
    expect(offCentre.ppmAbove).toBeGreaterThan(offCentre.ppmBelow);
    const upperOnly = stackCapability(0, 1, undefined, 4.5);
    expect(upperOnly.cp).toBeUndefined();
    expect(upperOnly.cpk).toBeCloseTo(1.5, 10);
    expect(upperOnly.ppmBelow).toBe(0);
    // "3.4 ppm" is Cpk 1.5 one-sided (reference §7).
    expect(upperOnly.ppmAbove).toBeCloseTo(3.4, 1);
  });
});
