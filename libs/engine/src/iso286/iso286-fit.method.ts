import { iso286FitInputSchema, type DerivationStep, type LengthUnit } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { defineMethod } from '../core/method.js';
import { formatNumber, MM_PER_INCH, roundTo, toMm } from '../core/units.js';
import { largestNominalSizeMm, mainStepUpperBounds } from './tables/size-steps.js';
import { classifyFit, type FitType } from './classify-fit.js';
import { findSizeStep, type SizeStep } from './find-size-step.js';
import { holeLimitDeviations } from './hole-limit-deviations.js';
import { type LimitDeviations } from './limit-deviations.js';
import { hundredthsToLength, inchDecimals, micrometresLatex, micrometresText } from './micrometre-hundredths.js';
import { parseToleranceClass } from './parse-tolerance-class.js';
import { shaftLimitDeviations } from './shaft-limit-deviations.js';
import { sideDerivationSteps } from './side-derivation-steps.js';
import { gradeRank, type FeatureSide } from './tolerance-class.js';

export interface Iso286SizeRange {
  over: number;
  upTo: number;
}

export interface Iso286Side {
  designation: string;
  upperDeviation: number;
  lowerDeviation: number;
  maxSize: number;
  minSize: number;
  itGrade: string;
  /** Upper minus lower deviation: the IT value, or 1 µm less where js/JS 7–11 rounds an odd IT. */
  toleranceValue: number;
  /** The standard tolerance IT of the grade at this size. */
  standardTolerance: number;
  /** The table row the fundamental deviation was read from (intermediate steps for a–c, r–zc). */
  deviationSizeRange: Iso286SizeRange;
}

export interface Iso286FitOutputs {
  hole: Iso286Side | null;
  shaft: Iso286Side | null;
  maxClearance: number | null;
  minClearance: number | null;
  fitType: FitType | null;
  sizeRange: Iso286SizeRange;
}

const um = '\\,\\mu\\text{m}';
/** A size typed in inches lands on a table bound only up to float noise (124.015748… in × 25.4). */
const snapMm = (value: number) => Math.round(value * 1e9) / 1e9;
const decimalSum = (a: number, b: number) => Number((a + b).toFixed(9));

export const iso286FitMethod = defineMethod({
  id: 'iso286-fit',
  version: 1,
  title: 'ISO limits and fits (ISO 286)',
  description:
    'Limit deviations and limits of a hole class (A–ZC) and/or a shaft class (a–zc) at grades IT01 to IT18 for nominal sizes up to 3150 mm, ' +
    'and for a pair the maximum and minimum clearance (negative is interference) and the fit type. Deviations come from the tables of ' +
    'ISO 286-1 shipped as data (never from the approximating formulas): shafts from the fundamental deviation tables, holes by the ' +
    'standard\'s rules (EI = −es for A–H; ES = −ei, plus Δ for K, M, N up to IT8 and P–ZC up to IT7), js/JS as ±IT/2 with odd ' +
    'grade 7–11 values rounded to even, and the M6 exception at 250–315 mm. A size on a range bound belongs to the lower range. ' +
    'Combinations the standard does not define are refused with the reason.',
  references: [
    'ISO 286-1:2010, Geometrical product specifications (GPS) — ISO code system for tolerances on linear sizes — Part 1: Basis of tolerances, deviations and fits',
    'ISO 286-2:2010, Part 2: Tables of standard tolerance classes and limit deviations for holes and shafts, including Technical Corrigendum (A13, E8, R10 and f9 cells)',
  ],
  cautions: [
    'A fit computed here is geometry only: it is not a strength, press-fit pressure, temperature or assembly-force check. Safety-critical fits (pressure retaining, lifting, rotating machinery) must be checked against the applicable codes and by a competent engineer.',
    'Limits are at 20 °C (ISO 1); parts of different materials change clearance with temperature.',
  ],
  inputSchema: iso286FitInputSchema,
  outputs: [
    { name: 'hole', label: 'Hole', kind: 'object', description: 'Designation, upper and lower deviation, max and min size, IT grade and tolerance of the hole class; null when no hole is given.' },
    { name: 'shaft', label: 'Shaft', kind: 'object', description: 'The same for the shaft class; null when no shaft is given.' },
    { name: 'maxClearance', label: 'Maximum clearance', kind: 'length', description: 'ES − ei; negative means interference. Null with one side only.' },
    { name: 'minClearance', label: 'Minimum clearance', kind: 'length', description: 'EI − es; negative means interference (the maximum interference). Null with one side only.' },
    { name: 'fitType', label: 'Fit type', kind: 'text', description: 'clearance, transition or interference; null with one side only.' },
    { name: 'sizeRange', label: 'Size range', kind: 'object', description: 'The ISO 286 nominal size range (over, up to and including) of the standard tolerance, in the request unit.' },
  ],
  evaluate(inputs, { unit }) {
    const sizeMm = snapMm(toMm(inputs.nominalSize, unit));
    if (sizeMm > largestNominalSizeMm) {
      const limitText = unit === 'mm' ? '3150 mm' : `${formatNumber(largestNominalSizeMm / MM_PER_INCH, 4)} in (3150 mm)`;
      throw EngineError.invalid({ nominalSize: `Nominal size must be at most ${limitText}: ISO 286 covers sizes up to 3150 mm` });
    }

    const requested: { side: FeatureSide; text: string }[] = [];
    if (inputs.hole !== undefined && inputs.hole.trim() !== '') requested.push({ side: 'hole', text: inputs.hole });
    if (inputs.shaft !== undefined && inputs.shaft.trim() !== '') requested.push({ side: 'shaft', text: inputs.shaft });

    const malformed: Record<string, string> = {};
    const parsed = requested.flatMap(({ side, text }) => {
      const result = parseToleranceClass(text, side);
      if (result.ok) return [result.value];
      malformed[side] = result.message;
      return [];
    });
    if (Object.keys(malformed).length > 0) throw EngineError.invalid(malformed);

    const undefinedFields: Record<string, string> = {};
    const sides: Partial<Record<FeatureSide, LimitDeviations>> = {};
    for (const toleranceClass of parsed) {
      const result = toleranceClass.side === 'hole' ? holeLimitDeviations(toleranceClass, sizeMm) : shaftLimitDeviations(toleranceClass, sizeMm);
      if (result.ok) sides[toleranceClass.side] = result.value;
      else undefinedFields[toleranceClass.side] = result.message;
    }
    const undefinedMessages = Object.values(undefinedFields);
    if (undefinedMessages.length > 0) {
      throw new EngineError('NOT_DEFINED_BY_STANDARD', undefinedMessages.join('; '), undefinedFields);
    }

    const range = findSizeStep(sizeMm, mainStepUpperBounds) as SizeStep;
    const length = (value: number) => hundredthsToLength(value, unit);
    const unitLatex = unit === 'mm' ? '\\,\\text{mm}' : '\\,\\text{in}';
    const warnings: string[] = [];
    const steps: DerivationStep[] = [
      {
        label: 'Nominal size range',
        latex:
          unit === 'mm'
            ? `${range.over} < D = ${formatNumber(sizeMm, 9)} \\le ${range.upTo}\\,\\text{mm}`
            : `D = ${formatNumber(inputs.nominalSize, 9)}\\,\\text{in} \\times 25.4 = ${formatNumber(sizeMm, 9)}\\,\\text{mm};\\quad ${range.over} < ${formatNumber(sizeMm, 9)} \\le ${range.upTo}\\,\\text{mm}`,
        value: `over ${range.over} mm up to and including ${range.upTo} mm`,
      },
    ];

    const describe = (limits: LimitDeviations | undefined): Iso286Side | null => {
      if (!limits) return null;
      const { toleranceClass, upper, lower } = limits;
      const upperDeviation = length(upper);
      const lowerDeviation = length(lower);
      const maxSize = decimalSum(inputs.nominalSize, upperDeviation);
      const minSize = decimalSum(inputs.nominalSize, lowerDeviation);
      const symbol = toleranceClass.side === 'hole' ? 'D' : 'd';
      const nominalText = formatNumber(inputs.nominalSize, 9);
      steps.push(...sideDerivationSteps(limits, sizeMm), {
        label: `Limits of ${toleranceClass.designation}`,
        latex:
          `${symbol}_{max} = ${nominalText} + ${lengthLatex(upperDeviation)} = ${formatNumber(maxSize, 9)}${unitLatex},\\quad ` +
          `${symbol}_{min} = ${nominalText} + ${lengthLatex(lowerDeviation)} = ${formatNumber(minSize, 9)}${unitLatex}`,
        value: `${formatNumber(minSize, 9)} to ${formatNumber(maxSize, 9)} ${unit}`,
      });
      if (limits.fundamental.source.rule === 'symmetric' && limits.fundamental.source.evenRounded) {
        warnings.push(
          `${toleranceClass.designation}: IT${toleranceClass.grade} = ${micrometresText(limits.standardTolerance.value)} µm is odd; ISO 286-2 rounds the class to ±${micrometresText(upper)} µm, so its tolerance is 1 µm less than IT.`,
        );
      }
      const rank = gradeRank(toleranceClass.grade);
      if (rank >= 1 && rank <= 5 && sizeMm > 500) {
        warnings.push(`${toleranceClass.designation}: ISO 286-1 gives IT1 to IT5 above 500 mm for experimental use only.`);
      }
      return {
        designation: toleranceClass.designation,
        upperDeviation,
        lowerDeviation,
        maxSize,
        minSize,
        itGrade: `IT${toleranceClass.grade}`,
        toleranceValue: length(upper - lower),
        standardTolerance: length(limits.standardTolerance.value),
        deviationSizeRange: convertRange(limits.deviationStep, unit),
      };
    };

    const hole = describe(sides.hole);
    const shaft = describe(sides.shaft);
    let maxClearance: number | null = null;
    let minClearance: number | null = null;
    let fitType: FitType | null = null;
    if (sides.hole && sides.shaft) {
      const fit = classifyFit(sides.hole, sides.shaft);
      maxClearance = length(fit.maxClearance);
      minClearance = length(fit.minClearance);
      fitType = fit.fitType;
      steps.push(
        {
          label: 'Maximum clearance',
          latex: `C_{max} = ES - ei = ${micrometresText(sides.hole.upper)} - ${micrometresLatex(sides.shaft.lower)} = ${micrometresText(fit.maxClearance)}${um}`,
          value: `${formatNumber(maxClearance, 9)} ${unit}`,
        },
        {
          label: 'Minimum clearance',
          latex: `C_{min} = EI - es = ${micrometresText(sides.hole.lower)} - ${micrometresLatex(sides.shaft.upper)} = ${micrometresText(fit.minClearance)}${um}`,
          value: `${formatNumber(minClearance, 9)} ${unit}${fit.minClearance < 0 ? ` (maximum interference ${micrometresText(-fit.minClearance)} µm)` : ''}`,
        },
        {
          label: 'Fit type',
          latex:
            fit.fitType === 'clearance'
              ? `C_{min} = ${micrometresText(fit.minClearance)} \\ge 0 \\Rightarrow \\text{clearance fit}`
              : fit.fitType === 'interference'
                ? `C_{max} = ${micrometresText(fit.maxClearance)} \\le 0 \\Rightarrow \\text{interference fit}`
                : `C_{min} = ${micrometresText(fit.minClearance)} < 0 < C_{max} = ${micrometresText(fit.maxClearance)} \\Rightarrow \\text{transition fit}`,
          value: `${fit.fitType} fit (${sides.hole.toleranceClass.designation}/${sides.shaft.toleranceClass.designation})`,
        },
      );
    }

    return {
      outputs: { hole, shaft, maxClearance, minClearance, fitType, sizeRange: convertRange(range, unit) } satisfies Iso286FitOutputs,
      warnings,
      steps,
    };

    function lengthLatex(value: number): string {
      const text = formatNumber(value, 9);
      return value < 0 ? `\\left(${text}\\right)` : text;
    }
  },
});

function convertRange(step: SizeStep, unit: LengthUnit): Iso286SizeRange {
  if (unit === 'mm') return { over: step.over, upTo: step.upTo };
  return { over: roundTo(step.over / MM_PER_INCH, inchDecimals), upTo: roundTo(step.upTo / MM_PER_INCH, inchDecimals) };
}
