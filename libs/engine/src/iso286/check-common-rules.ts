import { type StandardTolerance, standardTolerance } from './standard-tolerance.js';
import { gradeRank, type ToleranceClass } from './tolerance-class.js';

/**
 * The rules of ISO 286-1 that apply to holes and shafts alike: the grade must be tabulated for the
 * size, IT14–IT18 are not used up to 1 mm, and a/b (A/B) are not used up to 1 mm.
 */
export function checkCommonRules(
  toleranceClass: ToleranceClass,
  sizeMm: number,
): { ok: true; standardTolerance: StandardTolerance } | { ok: false; message: string } {
  const { grade, letter, designation } = toleranceClass;
  const tolerance = standardTolerance(grade, sizeMm);
  if (!tolerance) {
    return { ok: false, message: `${designation}: ISO 286-1 tabulates IT${grade} only up to 500 mm` };
  }
  if (gradeRank(grade) >= 14 && sizeMm <= 1) {
    return { ok: false, message: `${designation}: ISO 286-1 does not use IT14 to IT18 for nominal sizes up to 1 mm` };
  }
  if (['a', 'b'].includes(letter.toLowerCase()) && sizeMm <= 1) {
    return { ok: false, message: `${designation}: fundamental deviations ${letter} are not used for nominal sizes up to 1 mm (ISO 286-1)` };
  }
  return { ok: true, standardTolerance: tolerance };
}
