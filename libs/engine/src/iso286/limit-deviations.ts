import { type SizeStep } from './find-size-step.js';
import { type MicrometreHundredths } from './micrometre-hundredths.js';
import { type StandardTolerance } from './standard-tolerance.js';
import { type ToleranceClass } from './tolerance-class.js';

/** How the fundamental deviation was obtained, for the derivation shown to the user. */
export type FundamentalDeviationSource =
  /** Read from a table (a–h es, k–zc ei, j ei, J ES). */
  | { rule: 'table'; table: string }
  /** js/JS: ±IT/2, odd IT of grades 7–11 first reduced to the even value below. */
  | { rule: 'symmetric'; evenRounded: boolean }
  /** A hole from the same-letter shaft: EI = −es (A–H) or ES = −ei (K–ZC). */
  | { rule: 'mirror'; shaftDeviation: MicrometreHundredths }
  /** ES = −ei + Δ, Δ = IT(n) − IT(n−1) (K, M, N ≤ IT8; P–ZC ≤ IT7; 3–500 mm). */
  | { rule: 'mirror-plus-delta'; shaftDeviation: MicrometreHundredths; delta: MicrometreHundredths }
  /** A value the standard fixes outright (N above IT8 over 3 mm, K above IT8 up to 3 mm, M6 at 250–315 mm). */
  | { rule: 'fixed'; reason: string };

export interface LimitDeviations {
  toleranceClass: ToleranceClass;
  upper: MicrometreHundredths;
  lower: MicrometreHundredths;
  standardTolerance: StandardTolerance;
  /** The table row the fundamental deviation came from (the main range for js/JS and rule-fixed values). */
  deviationStep: SizeStep;
  fundamental: { which: 'upper' | 'lower'; value: MicrometreHundredths; source: FundamentalDeviationSource };
}

export type LimitDeviationsResult = { ok: true; value: LimitDeviations } | { ok: false; message: string };
