import { gradeRank, type ToleranceClass } from './tolerance-class.js';
import { type MicrometreHundredths } from './micrometre-hundredths.js';

/**
 * js/JS: ±IT/2. For grades 7 to 11 an odd IT in whole micrometres is first replaced by the even
 * value below, so the limits stay whole micrometres (ISO 286-2 js7 at 18–30 mm: ±10, not ±10.5).
 */
export function symmetricHalfTolerance(
  toleranceClass: ToleranceClass,
  standardTolerance: MicrometreHundredths,
): { half: MicrometreHundredths; evenRounded: boolean } {
  const rank = gradeRank(toleranceClass.grade);
  const wholeMicrometres = standardTolerance % 100 === 0;
  const odd = wholeMicrometres && (standardTolerance / 100) % 2 === 1;
  if (rank >= 7 && rank <= 11 && odd) return { half: (standardTolerance - 100) / 2, evenRounded: true };
  return { half: standardTolerance / 2, evenRounded: false };
}
