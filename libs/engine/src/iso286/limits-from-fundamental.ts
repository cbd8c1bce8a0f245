import { type SizeStep } from './find-size-step.js';
import { type LimitDeviations, type LimitDeviationsResult } from './limit-deviations.js';
import { type StandardTolerance } from './standard-tolerance.js';
import { type ToleranceClass } from './tolerance-class.js';

/**
 * Both limit deviations of a hole or shaft class from its fundamental deviation (ISO 286-1:2010
 * 4.3.2): the other limit lies one standard tolerance away, except for js/JS, which are ±half.
 */
export function limitsFromFundamental(
  toleranceClass: ToleranceClass,
  standardTolerance: StandardTolerance,
  deviationStep: SizeStep,
  fundamental: LimitDeviations['fundamental'],
): LimitDeviationsResult {
  const { which, value, source } = fundamental;
  // The symmetric half may be rounded to an even micrometre, so its limits are not IT apart.
  const other = source.rule === 'symmetric' ? -value : which === 'upper' ? value - standardTolerance.value : value + standardTolerance.value;
  const [upper, lower] = which === 'upper' ? [value, other] : [other, value];
  return { ok: true, value: { toleranceClass, upper, lower, standardTolerance, deviationStep, fundamental } };
}
