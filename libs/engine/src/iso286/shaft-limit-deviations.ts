import { jShaftGrades, jShaftLowerDeviationRows } from './tables/j-deviations.js';
import { mainStepUpperBounds } from './tables/size-steps.js';
import {
  lowerDeviationLetters,
  shaftLowerDeviationRows,
  shaftUpperDeviationRows,
  upperDeviationLetters,
} from './tables/shaft-fundamental-deviations.js';
import { checkCommonRules } from './check-common-rules.js';
import { findSizeStep } from './find-size-step.js';
import { type LimitDeviationsResult } from './limit-deviations.js';
import { limitsFromFundamental } from './limits-from-fundamental.js';
import { lookupDeviationCell, requireDeviationCell } from './lookup-deviation-cell.js';
import { hundredthsFromMicrometres } from './micrometre-hundredths.js';
import { symmetricHalfTolerance } from './symmetric-deviation.js';
import { gradeRank, type ToleranceClass } from './tolerance-class.js';

/** Upper (es) and lower (ei) limit deviations of a shaft tolerance class at a nominal size in mm. */
export function shaftLimitDeviations(toleranceClass: ToleranceClass, sizeMm: number): LimitDeviationsResult {
  const common = checkCommonRules(toleranceClass, sizeMm);
  if (!common.ok) return common;
  const it = common.standardTolerance;
  const { letter, designation } = toleranceClass;
  const rank = gradeRank(toleranceClass.grade);

  if (letter === 'js') {
    const { half, evenRounded } = symmetricHalfTolerance(toleranceClass, it.value);
    return limitsFromFundamental(toleranceClass, it, it.range, { which: 'upper', value: half, source: { rule: 'symmetric', evenRounded } });
  }

  if (letter === 'j') {
    const column = (jShaftGrades as readonly number[]).indexOf(rank);
    const cell = column < 0 ? undefined : lookupDeviationCell(jShaftLowerDeviationRows, column, sizeMm);
    if (!cell || cell.value === null) {
      return { ok: false, message: `${designation}: ISO 286 tabulates j only as j5, j6 and j7 up to 500 mm and j8 up to 3 mm` };
    }
    const lower = hundredthsFromMicrometres(cell.value);
    return fromLower(lower, cell.step, 'j (ISO 286-1 Table 2)');
  }

  const upperColumn = (upperDeviationLetters as readonly string[]).indexOf(letter);
  if (upperColumn >= 0) {
    const found = requireDeviationCell(shaftUpperDeviationRows, upperColumn, sizeMm, designation, letter);
    if (!found.ok) return found;
    const upper = hundredthsFromMicrometres(found.value);
    return limitsFromFundamental(toleranceClass, it, found.step, {
      which: 'upper',
      value: upper,
      source: { rule: 'table', table: 'shaft fundamental deviations a–h (ISO 286-1 Table 2)' },
    });
  }

  const lowerColumn = (lowerDeviationLetters as readonly string[]).indexOf(letter);
  const found = requireDeviationCell(shaftLowerDeviationRows, lowerColumn, sizeMm, designation, letter);
  if (!found.ok) return found;
  // k: the tabulated value holds for IT4–IT7 up to 500 mm; every other grade takes ei = 0.
  const kGradeRule = letter === 'k' && !(rank >= 4 && rank <= 7);
  const lower = kGradeRule ? 0 : hundredthsFromMicrometres(found.value);
  const step = kGradeRule ? (findSizeStep(sizeMm, mainStepUpperBounds) ?? found.step) : found.step;
  const table = kGradeRule
    ? 'k: ei = 0 for grades up to IT3 and above IT7 (ISO 286-1 Table 3)'
    : 'shaft fundamental deviations k–zc (ISO 286-1 Table 3)';
  return fromLower(lower, step, table);

  function fromLower(lowerDeviation: number, deviationStep: typeof it.range, table: string): LimitDeviationsResult {
    return limitsFromFundamental(toleranceClass, it, deviationStep, { which: 'lower', value: lowerDeviation, source: { rule: 'table', table } });
  }
}
