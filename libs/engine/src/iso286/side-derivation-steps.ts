import { type DerivationStep } from '@limitbook/contracts';
import { gradeNames } from './tables/standard-tolerance-grades.js';
import { type LimitDeviations } from './limit-deviations.js';
import { micrometresLatex, micrometresText, signedMicrometresText } from './micrometre-hundredths.js';
import { standardTolerance } from './standard-tolerance.js';

const um = '\\,\\mu\\text{m}';

export function gradeLatex(grade: string): string {
  return `\\mathrm{IT}${grade}`;
}

/** IT, fundamental deviation (with Δ where applied) and the other deviation of one tolerance class. */
export function sideDerivationSteps(limits: LimitDeviations, sizeMm: number): DerivationStep[] {
  const { toleranceClass, standardTolerance: it, fundamental, deviationStep } = limits;
  const { designation, grade, letter, side } = toleranceClass;
  const hole = side === 'hole';
  const upperSymbol = hole ? 'ES' : 'es';
  const lowerSymbol = hole ? 'EI' : 'ei';
  const fundamentalSymbol = fundamental.which === 'upper' ? upperSymbol : lowerSymbol;
  const otherSymbol = fundamental.which === 'upper' ? lowerSymbol : upperSymbol;
  const rangeText = `${deviationStep.over}–${deviationStep.upTo} mm`;
  const steps: DerivationStep[] = [
    {
      label: `Standard tolerance of ${designation}`,
      latex: `${gradeLatex(grade)} = ${micrometresText(it.value)}${um}`,
      value: `${micrometresText(it.value)} µm (ISO 286-1 Table 1, ${it.range.over}–${it.range.upTo} mm)`,
    },
  ];

  const source = fundamental.source;
  const value = fundamental.value;
  switch (source.rule) {
    case 'table':
      steps.push({
        label: `Fundamental deviation of ${designation}`,
        latex: `${fundamentalSymbol} = ${micrometresText(value)}${um}`,
        value: `${signedMicrometresText(value)} µm (${source.table}, ${rangeText})`,
      });
      break;
    case 'symmetric': {
      const formula = source.evenRounded
        ? `\\frac{${gradeLatex(grade)} - 1}{2} = \\frac{${micrometresText(it.value)} - 1}{2}`
        : `\\frac{${gradeLatex(grade)}}{2} = \\frac{${micrometresText(it.value)}}{2}`;
      steps.push({
        label: `Fundamental deviation of ${designation} (±IT/2)`,
        latex: `${upperSymbol} = ${formula} = ${micrometresText(value)}${um}`,
        value: source.evenRounded
          ? `+${micrometresText(value)} µm (odd IT of grade ${grade} reduced to the even value below, ISO 286-2)`
          : `+${micrometresText(value)} µm`,
      });
      break;
    }
    case 'mirror': {
      const shaftSymbol = fundamental.which === 'lower' ? 'es' : 'ei';
      steps.push({
        label: `Fundamental deviation of ${designation} from shaft ${letter.toLowerCase()}`,
        latex: `${fundamentalSymbol} = -${shaftSymbol}_{${letter.toLowerCase()}} = -${micrometresLatex(source.shaftDeviation)} = ${micrometresText(value)}${um}`,
        value: `${signedMicrometresText(value)} µm (ISO 286-1 Table 3, ${rangeText})`,
      });
      break;
    }
    case 'mirror-plus-delta': {
      const rank = gradeNames.indexOf(grade);
      const previousGrade = gradeNames[rank - 1] ?? grade;
      const previous = standardTolerance(previousGrade, sizeMm);
      steps.push({
        label: `Δ for ${designation}`,
        latex:
          previous && deviationStep.upTo > 3
            ? `\\Delta = ${gradeLatex(grade)} - ${gradeLatex(previousGrade)} = ${micrometresText(it.value)} - ${micrometresText(previous.value)} = ${micrometresText(source.delta)}${um}`
            : `\\Delta = ${micrometresText(source.delta)}${um}`,
        value: `${micrometresText(source.delta)} µm (ISO 286-1 Table 3${deviationStep.upTo <= 3 ? ': Δ = 0 up to 3 mm' : ''})`,
      });
      steps.push({
        label: `Fundamental deviation of ${designation} from shaft ${letter.toLowerCase()} plus Δ`,
        latex: `ES = -ei_{${letter.toLowerCase()}} + \\Delta = -${micrometresLatex(source.shaftDeviation)} + ${micrometresText(source.delta)} = ${micrometresText(value)}${um}`,
        value: `${signedMicrometresText(value)} µm (ISO 286-1 Table 3, ${rangeText})`,
      });
      break;
    }
    case 'fixed':
      steps.push({
        label: `Fundamental deviation of ${designation}`,
        latex: `${fundamentalSymbol} = ${micrometresText(value)}${um}`,
        value: `${signedMicrometresText(value)} µm (${source.reason})`,
      });
      break;
  }

  const other = fundamental.which === 'upper' ? limits.lower : limits.upper;
  const otherLatex =
    source.rule === 'symmetric'
      ? `${otherSymbol} = -${upperSymbol} = ${micrometresText(other)}${um}`
      : fundamental.which === 'upper'
        ? `${otherSymbol} = ${upperSymbol} - ${gradeLatex(grade)} = ${micrometresText(value)} - ${micrometresText(it.value)} = ${micrometresText(other)}${um}`
        : `${otherSymbol} = ${lowerSymbol} + ${gradeLatex(grade)} = ${micrometresText(value)} + ${micrometresText(it.value)} = ${micrometresText(other)}${um}`;
  steps.push({ label: `Other deviation of ${designation}`, latex: otherLatex, value: `${signedMicrometresText(other)} µm` });
  return steps;
}
