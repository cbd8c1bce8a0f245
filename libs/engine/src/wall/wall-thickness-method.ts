import { wallThicknessInputSchema, type DerivationStep, type Verdict } from '@limitbook/contracts';
import { lengthText } from '../boundary/length-text.js';
import { materialConditionSizes } from '../boundary/material-condition-sizes.js';
import { defineMethod } from '../core/method.js';
import { formatLength, roundLength } from '../core/units.js';
import { refuseMissingWall } from './refuse-missing-wall.js';
import type { WallAtSizes, WallModel } from './wall-at-sizes.js';
import { wallExtremes, type WallSweep } from './wall-extremes.js';
import { wallGeometry } from './wall-geometry.js';
import { bonusFormula, bonusSubstituted, geometryText, shiftFormula, shiftSubstituted, wallFormula, wallSubstituted } from './wall-latex.js';

export type WallThicknessOutputs = {
  minWall: number;
  maxWall: number;
  minWallAt: { featureSize: number; datumSize: number | null };
  maxWallAt: { featureSize: number; datumSize: number | null };
  bonusAtMinWall: number;
  datumShiftAtMinWall: number;
  positionAllowanceAtMinWall: number;
  offsetAtMinWall: number;
  minWallIsConstant: boolean;
  minWallSpread: number;
  sweep: WallSweep;
};

export const wallThicknessMethod = defineMethod({
  id: 'wall-thickness',
  version: 1,
  title: 'Wall between two features of size located by position',
  description:
    'Minimum and maximum wall between a located feature of size and the datum feature it is positioned to: coaxial (a bore in a boss, ' +
    'or a boss around a bore), or side by side at a basic distance (two holes, a hole off-centre inside a boss, or a hole near a plane ' +
    'datum face). The wall is measured along the line of centres, on the side where the features are nearest. Over every pair of ' +
    'produced sizes and every offset the position zone allows, with bonus tolerance (MMC/LMC) and datum feature shift (MMB/LMB) ' +
    'reported separately, it finds where the thinnest and thickest walls sit, sweeps both size ranges for a chart and says whether ' +
    'the minimum wall depends on size at all (it does not under LMC with the datum at LMB).',
  references: [
    'ASME Y14.5-2018, position tolerancing at MMC, LMC and RFS; datum features referenced at MMB, LMB and RMB (datum feature shift)',
    'ASME Y14.5M-1994, §5.3.5 (LMC to protect wall thickness)',
  ],
  cautions: [
    'A geometric wall is not a strength or pressure check. For pressure-containing walls defer to the applicable code (for example ASME BPVC, EN 13445 or the product standard) and licensed engineering practice.',
    'MMB and LMB are taken at the datum feature’s MMC and LMC sizes (a primary datum feature of size with no geometric tolerance of its own); form errors of the surfaces, including a plane datum face, are not included.',
  ],
  inputSchema: wallThicknessInputSchema,
  outputs: [
    { name: 'minWall', label: 'Minimum wall', kind: 'length', description: 'Thinnest wall over every allowed pair of sizes and offset.' },
    { name: 'maxWall', label: 'Maximum wall', kind: 'length', description: 'Thickest wall at the same place over every allowed pair of sizes and offset.' },
    { name: 'minWallAt', label: 'Minimum wall at', kind: 'object', description: 'Produced sizes of the located feature and the datum feature where the minimum wall occurs (the LMC pair when it is the same everywhere).' },
    { name: 'maxWallAt', label: 'Maximum wall at', kind: 'object', description: 'Produced sizes where the maximum wall occurs.' },
    { name: 'bonusAtMinWall', label: 'Bonus at minimum wall', kind: 'length', description: 'Bonus tolerance of the located feature at the minimum-wall sizes.' },
    { name: 'datumShiftAtMinWall', label: 'Datum feature shift at minimum wall', kind: 'length', description: 'Datum feature shift allowance (a diameter) at the minimum-wall sizes; not bonus.' },
    { name: 'positionAllowanceAtMinWall', label: 'Position allowance at minimum wall', kind: 'length', description: 'Tolerance + bonus + datum feature shift: the diameter within which the feature axis may lie about the datum feature’s axis.' },
    { name: 'offsetAtMinWall', label: 'Offset at minimum wall', kind: 'length', description: 'Half the position allowance: how far the axis may move toward the thin side.' },
    { name: 'minWallIsConstant', label: 'Minimum wall independent of size', kind: 'boolean', description: 'True when every produced pair of sizes gives the same minimum wall.' },
    { name: 'minWallSpread', label: 'Spread of the minimum wall', kind: 'length', description: 'Largest minus smallest of the per-size minimum walls.' },
    { name: 'sweep', label: 'Wall across the size ranges', kind: 'series', description: 'featureSizes (ascending) and one series per datum size with the minimum and maximum wall at each feature size.' },
  ],
  evaluate(inputs, { unit }) {
    const geometry = wallGeometry(inputs.arrangement, inputs.feature.featureType, inputs.datum.featureType, inputs.basicDistance);
    const datumIsPlane = inputs.datum.featureType === 'plane';
    const feature = materialConditionSizes(inputs.feature.featureType, inputs.feature.lowerLimit, inputs.feature.upperLimit);
    const datum =
      inputs.datum.featureType === 'plane'
        ? null
        : materialConditionSizes(inputs.datum.featureType, inputs.datum.lowerLimit as number, inputs.datum.upperLimit as number);
    const model: WallModel = {
      geometry,
      feature,
      datum,
      positionTolerance: inputs.positionTolerance,
      toleranceModifier: inputs.toleranceModifier,
      datumModifier: datumIsPlane ? 'RMB' : (inputs.datumModifier ?? 'RMB'),
    };
    const extremes = wallExtremes(model, unit);
    refuseMissingWall(model, extremes.thinnest, unit);

    const { thinnest, thickest } = extremes;
    const spread = roundLength(extremes.thinnestRange.high, unit) - roundLength(extremes.thinnestRange.low, unit);
    const minWallIsConstant = roundLength(spread, unit) === 0;
    const len = (value: number) => formatLength(value, unit);
    const show = (value: number) => lengthText(value, unit);
    const warnings: string[] = [];

    const steps: DerivationStep[] = [
      {
        label: 'Located feature',
        latex: `\\mathrm{MMC}_f = ${len(feature.mmcSize)},\\quad \\mathrm{LMC}_f = ${len(feature.lmcSize)}`,
        value: `${inputs.feature.featureType}, ${len(inputs.feature.lowerLimit)} to ${show(inputs.feature.upperLimit)}`,
      },
      datum === null
        ? { label: 'Datum feature', latex: '\\text{plane: no size, so no datum feature shift } (S = 0)', value: 'plane' }
        : {
            label: 'Datum feature boundaries',
            latex: `\\mathrm{MMB} = \\mathrm{MMC}_d = ${len(datum.mmcSize)},\\quad \\mathrm{LMB} = \\mathrm{LMC}_d = ${len(datum.lmcSize)}`,
            value: `${inputs.datum.featureType}, ${len(inputs.datum.lowerLimit as number)} to ${show(inputs.datum.upperLimit as number)}`,
          },
      { label: 'Wall along the line of centres', latex: wallFormula(geometry), value: geometryText(geometry) },
      {
        label: 'Offset allowed by the position zone',
        latex: `\\lvert\\delta\\rvert \\le e = \\tfrac{t + B + S}{2},\\quad ${bonusFormula(model)},\\quad ${shiftFormula(model)}`,
        value: `${inputs.toleranceModifier} / ${model.datumModifier}`,
      },
      {
        label: 'Bonus at the minimum-wall sizes',
        latex: bonusSubstituted(model, thinnest, len),
        value: show(thinnest.bonus),
      },
      {
        label: 'Datum feature shift at the minimum-wall sizes',
        latex: shiftSubstituted(model, thinnest, len),
        value: show(thinnest.datumShift),
      },
      {
        label: 'Offset allowance at the minimum-wall sizes',
        latex: `e = \\tfrac{${len(model.positionTolerance)} + ${len(thinnest.bonus)} + ${len(thinnest.datumShift)}}{2} = ${len(thinnest.offsetAllowance)}`,
        value: show(thinnest.offsetAllowance),
      },
      {
        label: 'Minimum wall',
        latex: `w_{\\min} = ${wallSubstituted(geometry, thinnest, thinnest.offsetAtThinnest, len)} = ${len(thinnest.thinnest)}`,
        value: show(thinnest.thinnest),
      },
      {
        label: 'Maximum wall',
        latex:
          `e = \\tfrac{${len(model.positionTolerance)} + ${len(thickest.bonus)} + ${len(thickest.datumShift)}}{2} = ${len(thickest.offsetAllowance)};\\quad ` +
          `w_{\\max} = ${wallSubstituted(geometry, thickest, -thickest.offsetAtThinnest, len)} = ${len(thickest.thickest)}`,
        value: show(thickest.thickest),
      },
    ];

    const gridText =
      datum === null
        ? `${extremes.gridSize.featureSizes} \\text{ produced sizes}`
        : `${extremes.gridSize.featureSizes} \\times ${extremes.gridSize.datumSizes} \\text{ size pairs}`;
    if (minWallIsConstant) {
      steps.push({
        label: 'Minimum wall across all produced sizes',
        latex: `w_{\\min}(D_f${datum === null ? '' : ', D_d'}) = ${len(thinnest.thinnest)}\\ \\text{at all } ${gridText} \\text{ (limits included)}`,
        value: `constant: ${show(thinnest.thinnest)} at every produced size`,
      });
    } else {
      steps.push({
        label: 'Minimum wall across all produced sizes',
        latex: `w_{\\min}(D_f${datum === null ? '' : ', D_d'}) \\in [${len(extremes.thinnestRange.low)},\\ ${len(extremes.thinnestRange.high)}]\\ \\text{over } ${gridText}`,
        value: `varies by ${show(spread)}`,
      });
      if (inputs.toleranceModifier === 'MMC') {
        warnings.push('With the position tolerance at MMC the wall is thinnest at LMC sizes, where bonus tolerance (and any datum feature shift) is largest; a tolerance at LMC with the datum at LMB holds the minimum wall the same at every size.');
      }
    }

    let verdict: Verdict | undefined;
    if (inputs.requiredMinWall !== undefined && inputs.requiredMinWall !== null) {
      const required = inputs.requiredMinWall;
      const pass = roundLength(thinnest.thinnest, unit) >= roundLength(required, unit);
      steps.push({
        label: 'Required minimum wall',
        latex: `w_{\\min} = ${len(thinnest.thinnest)} ${pass ? '\\ge' : '<'} ${len(required)}`,
        value: pass ? 'pass' : 'fail',
      });
      verdict = {
        pass,
        summary: pass ? `Minimum wall ${show(thinnest.thinnest)} meets the required ${show(required)}` : `Minimum wall ${show(thinnest.thinnest)} is below the required ${show(required)}`,
        checks: [{ label: 'Minimum wall', pass, detail: `${show(thinnest.thinnest)} against ${show(required)} required` }],
      };
    }

    const at = (wall: WallAtSizes) => ({
      featureSize: roundLength(wall.featureSize, unit),
      datumSize: wall.datumSize === null ? null : roundLength(wall.datumSize, unit),
    });
    const outputs: WallThicknessOutputs = {
      minWall: roundLength(thinnest.thinnest, unit),
      maxWall: roundLength(thickest.thickest, unit),
      minWallAt: at(thinnest),
      maxWallAt: at(thickest),
      bonusAtMinWall: roundLength(thinnest.bonus, unit),
      datumShiftAtMinWall: roundLength(thinnest.datumShift, unit),
      positionAllowanceAtMinWall: roundLength(thinnest.positionAllowance, unit),
      offsetAtMinWall: roundLength(thinnest.offsetAllowance, unit),
      minWallIsConstant,
      minWallSpread: roundLength(spread, unit),
      sweep: extremes.sweep,
    };
    return { outputs, ...(verdict ? { verdict } : {}), warnings, steps };
  },
});
