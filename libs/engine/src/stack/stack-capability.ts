import { normalTailProbability } from './normal-tail-probability.js';

export interface StackCapability {
  /** (USL − LSL)/6σ; only with both limits. */
  cp?: number;
  /** min(USL − μ, μ − LSL)/3σ over the limits given. */
  cpk: number;
  ppmBelow: number;
  ppmAbove: number;
  ppmTotal: number;
}

/** Capability indices and out-of-limit ppm of a normal distribution of the stack (definitions of Cp and Cpk). */
export function stackCapability(mean: number, sigma: number, lowerSpec: number | undefined, upperSpec: number | undefined): StackCapability {
  const zLower = lowerSpec === undefined ? Infinity : (mean - lowerSpec) / sigma;
  const zUpper = upperSpec === undefined ? Infinity : (upperSpec - mean) / sigma;
  const ppmBelow = lowerSpec === undefined ? 0 : 1e6 * normalTailProbability(zLower);
  const ppmAbove = upperSpec === undefined ? 0 : 1e6 * normalTailProbability(zUpper);
  return {
    ...(lowerSpec !== undefined && upperSpec !== undefined ? { cp: (upperSpec - lowerSpec) / (6 * sigma) } : {}),
    cpk: Math.min(zLower, zUpper) / 3,
    ppmBelow,
    ppmAbove,
    ppmTotal: ppmBelow + ppmAbove,
  };
}
