import { deltaGrades, deltaRows } from './tables/delta-values.js';
import { jHoleGrades, jHoleUpperDeviationRows } from './tables/j-deviations.js';
import { lowerDeviationLetters, shaftLowerDeviationRows, shaftUpperDeviationRows, upperDeviationLetters } from './tables/shaft-fundamental-deviations.js';
import { checkCommonRules } from './check-common-rules.js';
import { type SizeStep } from './find-size-step.js';
import { type FundamentalDeviationSource, type LimitDeviationsResult } from './limit-deviations.js';
import { limitsFromFundamental } from './limits-from-fundamental.js';
import { lookupDeviationCell, requireDeviationCell } from './lookup-deviation-cell.js';
import { hundredthsFromMicrometres, type MicrometreHundredths } from './micrometre-hundredths.js';
import { symmetricHalfTolerance } from './symmetric-deviation.js';
import { gradeRank, type ToleranceClass } from './tolerance-class.js';

/** Above this size ISO 286-1 applies no Δ and stops tabulating the K > IT8 and j/J columns. */
const deltaSizeLimitMm = 500;

/**
 * Upper (ES) and lower (EI) limit deviations of a hole tolerance class at a nominal size in mm,
 * by the rules of ISO 286-1:2010 Table 3: A–H mirror the shaft (EI = −es); K–ZC mirror it
 * (ES = −ei) with Δ added for K, M, N up to IT8 and P–ZC up to IT7; JS is ±IT/2; J is tabulated.
 */
export function holeLimitDeviations(toleranceClass: ToleranceClass, sizeMm: number): LimitDeviationsResult {
  const common = checkCommonRules(toleranceClass, sizeMm);
  if (!common.ok) return common;
  const it = common.standardTolerance;
  const { letter, designation } = toleranceClass;
  const rank = gradeRank(toleranceClass.grade);
  const shaftLetter = letter.toLowerCase();

  const fromUpper = (upper: MicrometreHundredths, step: SizeStep, source: FundamentalDeviationSource): LimitDeviationsResult =>
    limitsFromFundamental(toleranceClass, it, step, { which: 'upper', value: upper, source });
  const notDefined = (message: string): LimitDeviationsResult => ({ ok: false, message: `${designation}: ${message}` });

  if (letter === 'JS') {
    const { half, evenRounded } = symmetricHalfTolerance(toleranceClass, it.value);
    return fromUpper(half, it.range, { rule: 'symmetric', evenRounded });
  }

  if (letter === 'J') {
    const column = (jHoleGrades as readonly number[]).indexOf(rank);
    const cell = column < 0 ? undefined : lookupDeviationCell(jHoleUpperDeviationRows, column, sizeMm);
    if (!cell || cell.value === null) return notDefined('ISO 286 tabulates J only as J6, J7 and J8, up to 500 mm (use JS otherwise)');
    return fromUpper(hundredthsFromMicrometres(cell.value), cell.step, { rule: 'table', table: 'J (ISO 286-1 Table 3)' });
  }

  const upperColumn = (upperDeviationLetters as readonly string[]).indexOf(shaftLetter);
  if (upperColumn >= 0) {
    const found = requireDeviationCell(shaftUpperDeviationRows, upperColumn, sizeMm, designation, letter);
    if (!found.ok) return found;
    const shaftUpper = hundredthsFromMicrometres(found.value);
    const lower = shaftUpper === 0 ? 0 : -shaftUpper;
    return limitsFromFundamental(toleranceClass, it, found.step, { which: 'lower', value: lower, source: { rule: 'mirror', shaftDeviation: shaftUpper } });
  }

  const lowerColumn = (lowerDeviationLetters as readonly string[]).indexOf(shaftLetter);
  const found = requireDeviationCell(shaftLowerDeviationRows, lowerColumn, sizeMm, designation, letter);
  if (!found.ok) return found;
  const shaftLower = hundredthsFromMicrometres(found.value);
  const mirrored = shaftLower === 0 ? 0 : -shaftLower;
  const mirror = (): LimitDeviationsResult => fromUpper(mirrored, found.step, { rule: 'mirror', shaftDeviation: shaftLower });
  const fixed = (upper: number, reason: string): LimitDeviationsResult => fromUpper(upper, it.range, { rule: 'fixed', reason });

  const isKMN = ['K', 'M', 'N'].includes(letter);
  if (sizeMm > deltaSizeLimitMm) {
    if (letter === 'K' && rank > 8) return notDefined('ISO 286-1 gives K above IT8 only up to 3 mm');
    return mirror();
  }

  const deltaUpToGrade = isKMN ? 8 : 7;
  if (rank > deltaUpToGrade) {
    if (letter === 'K') return sizeMm <= 3 ? fixed(0, 'K above IT8 up to 3 mm: ES = 0 (ISO 286-1 Table 3)') : notDefined('ISO 286-1 gives K above IT8 only up to 3 mm');
    if (letter === 'N') {
      if (sizeMm <= 1) return notDefined('ISO 286-1 does not use N above IT8 for nominal sizes up to 1 mm');
      if (sizeMm > 3) return fixed(0, 'N above IT8 over 3 mm: ES = 0 (ISO 286-1 Table 3)');
    }
    return mirror();
  }

  if (rank < 3) return notDefined(`ISO 286-1 tabulates Δ only for IT3 to IT8, so ${letter} has no IT${toleranceClass.grade} class up to 500 mm`);
  if (letter === 'M' && rank === 6 && it.range.over === 250 && it.range.upTo === 315) {
    return fixed(-900, 'M6 at 250–315 mm: ES = −9 µm, the exception stated in ISO 286-1 Table 3 (the rule would give −11 µm)');
  }
  const deltaCell = lookupDeviationCell(deltaRows, (deltaGrades as readonly number[]).indexOf(rank), sizeMm);
  const delta = hundredthsFromMicrometres(deltaCell?.value ?? 0);
  return fromUpper(mirrored + delta, found.step, { rule: 'mirror-plus-delta', shaftDeviation: shaftLower, delta });
}
