import { type MicrometreHundredths } from './micrometre-hundredths.js';

export type FitType = 'clearance' | 'transition' | 'interference';

export interface FitClearances {
  /** ES − ei: the loosest assembly; negative is interference. */
  maxClearance: MicrometreHundredths;
  /** EI − es: the tightest assembly; negative is interference. */
  minClearance: MicrometreHundredths;
  fitType: FitType;
}

/**
 * Clearance fit when the tightest assembly still has clearance (min ≥ 0, zero included: H7/h6),
 * interference fit when the loosest assembly has none (max ≤ 0: H7/p6 at 10 mm), transition otherwise.
 */
export function classifyFit(
  hole: { upper: MicrometreHundredths; lower: MicrometreHundredths },
  shaft: { upper: MicrometreHundredths; lower: MicrometreHundredths },
): FitClearances {
  const maxClearance = hole.upper - shaft.lower;
  const minClearance = hole.lower - shaft.upper;
  const fitType: FitType = minClearance >= 0 ? 'clearance' : maxClearance <= 0 ? 'interference' : 'transition';
  return { maxClearance, minClearance, fitType };
}
