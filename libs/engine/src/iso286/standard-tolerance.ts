import { mainStepUpperBounds } from './tables/size-steps.js';
import { gradeNames, standardToleranceRows, type GradeName } from './tables/standard-tolerance-grades.js';
import { findSizeStep, type SizeStep } from './find-size-step.js';
import { hundredthsFromMicrometres, type MicrometreHundredths } from './micrometre-hundredths.js';

export interface StandardTolerance {
  grade: GradeName;
  value: MicrometreHundredths;
  range: SizeStep;
}

/** The tabulated standard tolerance IT for a grade and nominal size; undefined where the table has no cell. */
export function standardTolerance(grade: GradeName, sizeMm: number): StandardTolerance | undefined {
  const range = findSizeStep(sizeMm, mainStepUpperBounds);
  if (!range) return undefined;
  const cell = standardToleranceRows[range.index]?.[1 + gradeNames.indexOf(grade)];
  if (cell === null || cell === undefined) return undefined;
  return { grade, value: hundredthsFromMicrometres(cell), range };
}
