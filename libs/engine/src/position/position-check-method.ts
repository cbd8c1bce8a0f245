import { positionCheckInputSchema, type DerivationStep, type Verdict } from '@limitbook/contracts';
import { lengthText } from '../boundary/length-text.js';
import { materialConditionSizes } from '../boundary/material-condition-sizes.js';
import { defineMethod } from '../core/method.js';
import { formatLength, roundLength } from '../core/units.js';
import { datumFeatureShift } from '../wall/datum-feature-shift.js';
import { featurePosition, type FeaturePosition } from './feature-position.js';
import { groupTranslation, type Disc } from './group-translation.js';

export type PositionRow = {
  label: string;
  dx: number;
  dy: number;
  deviation: number;
  actualSize: number;
  sizeConforms: boolean;
  bonus: number;
  allowed: number;
  conformsAsMeasured: boolean;
  /** Deviation from true position after the pattern's group shift; null when the pattern cannot conform. */
  deviationWithShift: number | null;
};

export type PositionCheckOutputs = {
  features: PositionRow[];
  sizeTolerance: number;
  maxBonus: number;
  datumShift: number;
  featuresConformingAsMeasured: number;
  conformsAsMeasured: boolean;
  patternConforms: boolean;
  shiftX: number | null;
  shiftY: number | null;
  shiftUsed: number | null;
};

// Relative to the largest coordinate or size: far below any measuring resolution, far above binary noise.
const relativeEpsilon = 1e-9;

export const positionCheckMethod = defineMethod({
  id: 'position-check',
  version: 1,
  title: 'Position check of measured features',
  description:
    'Checks measured axis locations and actual sizes of a pattern of holes or pins against a position tolerance (a diameter) at MMC, LMC or RFS. ' +
    'Each feature’s deviation is converted to a diameter, 2·√(dx² + dy²), and compared with the stated tolerance plus its bonus ' +
    '(the departure of its actual size from the stated material condition). With a primary datum feature of size referenced at MMB or LMB, ' +
    'the pattern may also move as a group relative to the datum axis by up to half the datum feature shift; the method finds whether one ' +
    'translation brings every feature within its zone, and reports it. The shift is never added to each feature’s tolerance.',
  references: [
    'ASME Y14.5-2018, Section 10 (tolerances of location: position), bonus tolerance and datum feature shift at MMB/LMB',
    'Conversion of coordinate offsets to a diametral position: position = 2·√(Δx² + Δy²), as in common inspection practice',
  ],
  cautions: [
    'The pattern shift is a translation only: rotation of the pattern about the datum axis is not considered, so a pattern that conforms only when clocked is reported as not conforming.',
    'The datum feature of size is treated as the pattern’s only source of shift; the secondary and tertiary datums are taken as a fixed frame of planes.',
    'Actual sizes are taken as measured (actual mating size); a bonus from a size that ignores the feature’s orientation to the datums can accept a bad part.',
    'Measured coordinates must already be in the datum reference frame of the drawing; measuring uncertainty is not deducted.',
  ],
  inputSchema: positionCheckInputSchema,
  outputs: [
    {
      name: 'features',
      label: 'Features',
      kind: 'table',
      description:
        'Per feature: dx, dy, deviation as a diameter, actual size, size within limits, bonus, allowed tolerance, conformance as measured (no shift) and the deviation after the pattern’s group shift.',
    },
    { name: 'datumShift', label: 'Datum feature shift available', kind: 'length', description: 'Departure of the datum feature’s actual size from its MMB or LMB, a diameter; zero at RMB or without a datum feature of size.' },
    { name: 'sizeTolerance', label: 'Size tolerance', kind: 'length', description: 'Upper limit minus lower limit of the features.' },
    { name: 'maxBonus', label: 'Largest bonus', kind: 'length', description: 'Bonus at the opposite size limit; zero at RFS.' },
    { name: 'featuresConformingAsMeasured', label: 'Features conforming as measured', kind: 'number', description: 'Features within size limits and within their position zone with no shift.' },
    { name: 'conformsAsMeasured', label: 'Pattern conforms as measured', kind: 'boolean', description: 'Every feature conforms without any datum feature shift.' },
    { name: 'patternConforms', label: 'Pattern conforms', kind: 'boolean', description: 'Every feature is within size limits and one translation of the pattern within the datum feature shift brings every axis into its zone.' },
    { name: 'shiftX', label: 'Group shift X', kind: 'length', description: 'X of the translation used; null when none is needed or none works.' },
    { name: 'shiftY', label: 'Group shift Y', kind: 'length', description: 'Y of the translation used; null when none is needed or none works.' },
    { name: 'shiftUsed', label: 'Group shift used', kind: 'length', description: 'Size of the translation used as a diameter (2·|s|), to compare with the datum feature shift available.' },
  ],
  evaluate(inputs, { unit }) {
    const { featureType, lowerLimit, upperLimit, positionTolerance, toleranceModifier, datum, datumModifier, features } = inputs;
    const len = (value: number) => formatLength(value, unit);
    const show = (value: number) => lengthText(value, unit);
    const sizes = materialConditionSizes(featureType, lowerLimit, upperLimit);
    const sizeTolerance = upperLimit - lowerLimit;
    const maxBonus = toleranceModifier === 'RFS' ? 0 : sizeTolerance;
    const warnings: string[] = [];

    const scale = Math.max(1, upperLimit, ...features.flatMap((f) => [Math.abs(f.basicX), Math.abs(f.basicY), Math.abs(f.measuredX), Math.abs(f.measuredY)]));
    const epsilon = scale * relativeEpsilon;

    const datumSizes =
      datum && typeof datum.lowerLimit === 'number' && typeof datum.upperLimit === 'number' && typeof datum.actualSize === 'number'
        ? { ...materialConditionSizes(datum.featureType, datum.lowerLimit, datum.upperLimit), actual: datum.actualSize }
        : undefined;
    const datumShift = datumSizes && datumModifier ? datumFeatureShift(datumSizes.actual, datumModifier, datumSizes) : 0;
    if (datumSizes) {
      const low = Math.min(datumSizes.mmcSize, datumSizes.lmcSize);
      const high = Math.max(datumSizes.mmcSize, datumSizes.lmcSize);
      if (datumSizes.actual < low - epsilon || datumSizes.actual > high + epsilon) {
        warnings.push(`The datum feature’s actual size ${show(datumSizes.actual)} is outside its limits: the part is nonconforming on the datum feature; its shift is capped at the datum’s size tolerance.`);
      }
    }

    const results: FeaturePosition[] = features.map((feature) => featurePosition(feature, sizes, positionTolerance, toleranceModifier, epsilon));
    const allSizesConform = results.every((result) => result.sizeConforms);
    const conformsAsMeasured = results.every((result) => result.positionConforms);

    // Pattern with datum feature shift: one translation s, |s| ≤ shift/2, with |d_i − s| ≤ allowed_i/2 for every feature.
    let translation: { x: number; y: number } | undefined;
    if (conformsAsMeasured) translation = { x: 0, y: 0 };
    else if (allSizesConform && datumShift > 0) {
      const shiftDisc: Disc = { x: 0, y: 0, r: datumShift / 2 };
      // A zone that holds the whole shift disc cannot bind, so it is left out of the search.
      const binding = results
        .map((result): Disc => ({ x: result.dx, y: result.dy, r: result.allowed / 2 }))
        .filter((disc) => Math.hypot(disc.x, disc.y) + shiftDisc.r > disc.r - epsilon);
      const found = groupTranslation([shiftDisc, ...binding], epsilon);
      if (found.feasible) translation = { x: found.x, y: found.y };
    }
    const patternConforms = translation !== undefined;
    const shiftNeeded = patternConforms && !conformsAsMeasured;

    const rows: PositionRow[] = features.map((feature, index) => {
      const result = results[index]!;
      return {
        label: feature.label,
        dx: roundLength(result.dx, unit),
        dy: roundLength(result.dy, unit),
        deviation: roundLength(result.deviation, unit),
        actualSize: roundLength(feature.actualSize, unit),
        sizeConforms: result.sizeConforms,
        bonus: roundLength(result.bonus, unit),
        allowed: roundLength(result.allowed, unit),
        conformsAsMeasured: result.positionConforms,
        deviationWithShift: translation ? roundLength(2 * Math.hypot(result.dx - translation.x, result.dy - translation.y), unit) : null,
      };
    });
    const conformingCount = results.filter((result) => result.positionConforms).length;

    // The derivation follows the feature with the least margin, as an inspector would show it.
    const worstIndex = results.reduce((worst, result, index) => (result.deviation - result.allowed > results[worst]!.deviation - results[worst]!.allowed ? index : worst), 0);
    const worst = results[worstIndex]!;
    const worstFeature = features[worstIndex]!;
    const name = `\\text{${worstFeature.label.replace(/[\\{}$&#^_%~]/g, '')}}`;
    const steps: DerivationStep[] = [
      { label: 'MMC size', latex: `\\mathrm{MMC} = ${featureType === 'internal' ? '\\text{lower limit}' : '\\text{upper limit}'} = ${len(sizes.mmcSize)}`, value: show(sizes.mmcSize) },
      { label: 'Size tolerance', latex: `T_s = ${len(upperLimit)} - ${len(lowerLimit)} = ${len(sizeTolerance)}`, value: show(sizeTolerance) },
      {
        label: `Offsets of ${worstFeature.label} (least margin)`,
        latex: `\\Delta x = ${len(worstFeature.measuredX)} - ${len(worstFeature.basicX)} = ${len(worst.dx)}, \\quad \\Delta y = ${len(worstFeature.measuredY)} - ${len(worstFeature.basicY)} = ${len(worst.dy)}`,
        value: `${len(worst.dx)}, ${len(worst.dy)} ${unit}`,
      },
      {
        label: `Position deviation of ${worstFeature.label}, as a diameter`,
        latex: `\\varnothing_{${name}} = 2\\sqrt{\\Delta x^2 + \\Delta y^2} = 2\\sqrt{(${len(worst.dx)})^2 + (${len(worst.dy)})^2} = ${len(worst.deviation)}`,
        value: show(worst.deviation),
      },
      toleranceModifier === 'RFS'
        ? { label: `Bonus of ${worstFeature.label}`, latex: 'B = 0 \\quad (\\text{RFS: no bonus})', value: show(0) }
        : worst.sizeConforms
          ? {
              label: `Bonus of ${worstFeature.label}`,
              latex: `B = \\lvert ${len(worstFeature.actualSize)} - ${len(toleranceModifier === 'MMC' ? sizes.mmcSize : sizes.lmcSize)} \\rvert = ${len(worst.bonus)} \\le T_s`,
              value: show(worst.bonus),
            }
          : { label: `Bonus of ${worstFeature.label}`, latex: `B = 0 \\quad (\\text{actual size } ${len(worstFeature.actualSize)} \\text{ outside the size limits})`, value: show(0) },
      {
        label: `Allowed tolerance of ${worstFeature.label}`,
        latex: `t + B = ${len(positionTolerance)} + ${len(worst.bonus)} = ${len(worst.allowed)} \\; ${worst.positionConforms ? '\\ge' : '<'} \\; ${len(worst.deviation)}`,
        value: show(worst.allowed),
      },
      datumSizes && datumModifier && datumModifier !== 'RMB'
        ? {
            label: 'Datum feature shift available',
            latex: `S = \\lvert ${len(datumSizes.actual)} - ${len(datumModifier === 'MMB' ? datumSizes.mmcSize : datumSizes.lmcSize)} \\rvert = ${len(datumShift)}`,
            value: show(datumShift),
          }
        : { label: 'Datum feature shift available', latex: `S = 0 \\quad (${datumSizes ? '\\text{datum at RMB}' : '\\text{no datum feature of size}'})`, value: show(0) },
    ];
    if (!conformsAsMeasured && allSizesConform && datumShift > 0) {
      steps.push({
        label: 'Pattern shift (translation only, no rotation; secondary and tertiary datums fixed)',
        latex: `\\exists\\, \\vec s:\\ \\lvert \\vec s \\rvert \\le \\tfrac{S}{2} = ${len(datumShift / 2)}, \\ \\lvert \\vec d_i - \\vec s \\rvert \\le \\tfrac{t + B_i}{2} \\ \\forall i${
          translation ? ` \\quad \\vec s = (${len(translation.x)}, ${len(translation.y)})` : ' \\quad \\text{no such } \\vec s'
        }`,
        value: translation ? `${len(translation.x)}, ${len(translation.y)} ${unit}` : 'none',
      });
    }

    const failingSize = results.map((result, index) => (result.sizeConforms ? null : features[index]!.label)).filter((label): label is string => label !== null);
    const failingPosition = results.map((result, index) => (result.sizeConforms && !result.positionConforms ? features[index]!.label : null)).filter((label): label is string => label !== null);
    if (failingSize.length > 0) warnings.push(`Outside the size limits (no bonus, and no shift can accept them): ${listLabels(failingSize)}.`);
    if (shiftNeeded) {
      warnings.push(
        `Conforms only with the pattern moved as a group by ${show(2 * Math.hypot(translation!.x, translation!.y))} (diameter) of the ${show(datumShift)} datum feature shift available; rotation of the pattern is not considered.`,
      );
    } else if (!conformsAsMeasured && allSizesConform && datumShift > 0) {
      warnings.push('No translation within the datum feature shift brings every feature into its zone; rotation of the pattern is not considered and might.');
    }

    const verdict: Verdict = {
      pass: patternConforms,
      summary: patternConforms
        ? shiftNeeded
          ? `Pattern conforms with datum feature shift: ${features.length - conformingCount} of ${features.length} features are outside their zone as measured and within it after the group shift.`
          : `Pattern conforms as measured: all ${features.length} features within size and position.`
        : failingSize.length > 0
          ? `Pattern does not conform: ${failingSize.length} of ${features.length} features outside their size limits${failingPosition.length > 0 ? `, ${failingPosition.length} outside position as measured` : ''}.`
          : `Pattern does not conform: ${failingPosition.length} of ${features.length} features outside position${datumShift > 0 ? ', and no group shift within the datum feature shift brings them all in' : ''}.`,
      checks: [
        { label: 'Sizes within limits', pass: allSizesConform, detail: `${features.length - failingSize.length} of ${features.length}` },
        { label: 'Position as measured (no shift)', pass: conformsAsMeasured, detail: `${conformingCount} of ${features.length}${failingPosition.length ? `; outside: ${listLabels(failingPosition)}` : ''}` },
        {
          label: 'Pattern with datum feature shift',
          pass: patternConforms,
          detail: !allSizesConform ? 'not applicable: a feature is outside its size limits' : datumShift > 0 ? `shift available ${show(datumShift)}` : 'no datum feature shift available',
        },
      ],
    };

    const outputs: PositionCheckOutputs = {
      features: rows,
      sizeTolerance: roundLength(sizeTolerance, unit),
      maxBonus: roundLength(maxBonus, unit),
      datumShift: roundLength(datumShift, unit),
      featuresConformingAsMeasured: conformingCount,
      conformsAsMeasured,
      patternConforms,
      shiftX: shiftNeeded ? roundLength(translation!.x, unit) : null,
      shiftY: shiftNeeded ? roundLength(translation!.y, unit) : null,
      shiftUsed: shiftNeeded ? roundLength(2 * Math.hypot(translation!.x, translation!.y), unit) : null,
    };
    return { outputs, verdict, warnings, steps };
  },
});

function listLabels(labels: string[]): string {
  return labels.length <= 8 ? labels.join(', ') : `${labels.slice(0, 8).join(', ')} and ${labels.length - 8} more`;
}
