import { featureBoundaryInputSchema, type DerivationStep } from '@limitbook/contracts';
import { defineMethod } from '../core/method.js';
import { formatLength, roundLength } from '../core/units.js';
import { bonusTable, type BonusRow } from './bonus-table.js';
import { featureBoundaries } from './feature-boundaries.js';
import { lengthText } from './length-text.js';
import { materialConditionSizes } from './material-condition-sizes.js';

export type FeatureBoundaryOutputs = {
  mmcSize: number;
  lmcSize: number;
  sizeTolerance: number;
  virtualCondition: number | null;
  resultantCondition: number | null;
  innerBoundary: number;
  outerBoundary: number;
  maxBonus: number;
  bonusTable: BonusRow[];
};

export const featureBoundaryMethod = defineMethod({
  id: 'feature-boundary',
  version: 1,
  title: 'Boundaries of a feature of size',
  description:
    'MMC and LMC sizes, virtual and resultant condition, inner and outer boundary and the bonus tolerance across the size range ' +
    'of an internal or external feature of size with a geometric tolerance (a diameter zone, such as position) at MMC, LMC or RFS. ' +
    'At RFS the tolerance does not grow with size, so there is no bonus; the inner and outer boundaries are the worst-case ' +
    'boundaries MMC ∓ t and LMC ± t. Virtual and resultant condition are defined only for a tolerance at MMC or LMC: at RFS ' +
    'they are returned as null with a warning.',
  references: [
    'ASME Y14.5-2018, definitions of virtual condition, resultant condition, inner and outer boundary, and bonus tolerance',
  ],
  cautions: ['Assumes the geometric tolerance is a diameter zone on the feature axis (as position); a rectangular zone applies per direction.'],
  inputSchema: featureBoundaryInputSchema,
  outputs: [
    { name: 'mmcSize', label: 'MMC size', kind: 'length', description: 'Size with the most material: smallest internal, largest external feature.' },
    { name: 'lmcSize', label: 'LMC size', kind: 'length', description: 'Size with the least material.' },
    { name: 'sizeTolerance', label: 'Size tolerance', kind: 'length', description: 'Upper limit minus lower limit.' },
    { name: 'virtualCondition', label: 'Virtual condition', kind: 'length', description: 'Constant boundary from the stated material condition and the tolerance; null at RFS.' },
    { name: 'resultantCondition', label: 'Resultant condition', kind: 'length', description: 'Worst-case boundary on the opposite side from the virtual condition; null at RFS.' },
    { name: 'innerBoundary', label: 'Inner boundary', kind: 'length', description: 'Worst-case boundary on the inside of the feature.' },
    { name: 'outerBoundary', label: 'Outer boundary', kind: 'length', description: 'Worst-case boundary on the outside of the feature.' },
    { name: 'maxBonus', label: 'Maximum bonus', kind: 'length', description: 'Bonus tolerance at the opposite size limit; zero at RFS.' },
    { name: 'bonusTable', label: 'Bonus table', kind: 'table', description: 'Rows of actual size, bonus and total tolerance from the stated material condition to the opposite limit.' },
  ],
  evaluate(inputs, { unit }) {
    const { featureType, lowerLimit, upperLimit, tolerance, modifier } = inputs;
    const len = (value: number) => formatLength(value, unit);
    const show = (value: number) => lengthText(value, unit);
    const sizes = materialConditionSizes(featureType, lowerLimit, upperLimit);
    const sizeTolerance = upperLimit - lowerLimit;
    const boundaries = featureBoundaries(featureType, modifier, sizes, tolerance);
    const maxBonus = modifier === 'RFS' ? 0 : sizeTolerance;
    const internal = featureType === 'internal';
    const warnings: string[] = [];

    const steps: DerivationStep[] = [
      {
        label: 'MMC size',
        latex: `\\mathrm{MMC} = ${internal ? '\\text{lower limit}' : '\\text{upper limit}'} = ${len(sizes.mmcSize)}`,
        value: show(sizes.mmcSize),
      },
      {
        label: 'LMC size',
        latex: `\\mathrm{LMC} = ${internal ? '\\text{upper limit}' : '\\text{lower limit}'} = ${len(sizes.lmcSize)}`,
        value: show(sizes.lmcSize),
      },
      {
        label: 'Size tolerance',
        latex: `T_s = ${len(upperLimit)} - ${len(lowerLimit)} = ${len(sizeTolerance)}`,
        value: show(sizeTolerance),
      },
    ];
    // Signs follow the feature type: growing the tolerance makes a hole's boundary smaller on the MMC side, a pin's larger.
    const [toMmc, toLmc] = internal ? ['-', '+'] : ['+', '-'];
    if (modifier === 'RFS') {
      warnings.push('At RFS the standard defines no virtual or resultant condition: they are returned as null; the inner and outer boundaries are the worst-case boundaries.');
      const mmcSide = sizes.mmcSize + (internal ? -tolerance : tolerance);
      const lmcSide = sizes.lmcSize + (internal ? tolerance : -tolerance);
      const [innerFormula, outerFormula] = internal
        ? [`\\mathrm{MMC} - t = ${len(sizes.mmcSize)} - ${len(tolerance)}`, `\\mathrm{LMC} + t = ${len(sizes.lmcSize)} + ${len(tolerance)}`]
        : [`\\mathrm{LMC} - t = ${len(sizes.lmcSize)} - ${len(tolerance)}`, `\\mathrm{MMC} + t = ${len(sizes.mmcSize)} + ${len(tolerance)}`];
      steps.push(
        { label: 'Virtual and resultant condition', latex: '\\text{not defined at RFS}', value: '—' },
        { label: 'Inner boundary', latex: `\\mathrm{IB} = ${innerFormula} = ${len(Math.min(mmcSide, lmcSide))}`, value: show(boundaries.innerBoundary) },
        { label: 'Outer boundary', latex: `\\mathrm{OB} = ${outerFormula} = ${len(Math.max(mmcSide, lmcSide))}`, value: show(boundaries.outerBoundary) },
      );
    } else {
      const atMmc = modifier === 'MMC';
      const stated = atMmc ? sizes.mmcSize : sizes.lmcSize;
      const opposite = atMmc ? sizes.lmcSize : sizes.mmcSize;
      const [vcSign, rcSign] = atMmc ? [toMmc, toLmc] : [toLmc, toMmc];
      steps.push(
        {
          label: 'Virtual condition',
          latex: `\\mathrm{VC} = \\mathrm{${modifier}} ${vcSign} t = ${len(stated)} ${vcSign} ${len(tolerance)} = ${len(boundaries.virtualCondition as number)}`,
          value: show(boundaries.virtualCondition as number),
        },
        {
          label: 'Resultant condition',
          latex: `\\mathrm{RC} = \\mathrm{${atMmc ? 'LMC' : 'MMC'}} ${rcSign} (t + T_s) = ${len(opposite)} ${rcSign} (${len(tolerance)} + ${len(sizeTolerance)}) = ${len(boundaries.resultantCondition as number)}`,
          value: show(boundaries.resultantCondition as number),
        },
      );
    }
    if (modifier === 'RFS') {
      steps.push({ label: 'Maximum bonus', latex: 'B_{\\max} = 0 \\quad (\\text{RFS: no bonus})', value: show(0) });
    } else {
      const innerIsVirtual = boundaries.virtualCondition === boundaries.innerBoundary;
      steps.push(
        { label: 'Inner boundary', latex: `\\mathrm{IB} = ${innerIsVirtual ? '\\mathrm{VC}' : '\\mathrm{RC}'} = ${len(boundaries.innerBoundary)}`, value: show(boundaries.innerBoundary) },
        { label: 'Outer boundary', latex: `\\mathrm{OB} = ${innerIsVirtual ? '\\mathrm{RC}' : '\\mathrm{VC}'} = ${len(boundaries.outerBoundary)}`, value: show(boundaries.outerBoundary) },
        {
          label: 'Maximum bonus',
          latex: `B_{\\max} = \\lvert \\mathrm{${modifier === 'MMC' ? 'LMC' : 'MMC'}} - \\mathrm{${modifier}} \\rvert = T_s = ${len(maxBonus)}`,
          value: show(maxBonus),
        },
        {
          label: `Total tolerance at ${modifier === 'MMC' ? 'LMC' : 'MMC'} size`,
          latex: `t + B_{\\max} = ${len(tolerance)} + ${len(maxBonus)} = ${len(tolerance + maxBonus)}`,
          value: show(tolerance + maxBonus),
        },
      );
    }
    if (roundLength(boundaries.innerBoundary, unit) <= 0) {
      warnings.push('The inner boundary is not positive: the tolerance is larger than the feature can hold; check the inputs.');
    }

    const outputs: FeatureBoundaryOutputs = {
      mmcSize: roundLength(sizes.mmcSize, unit),
      lmcSize: roundLength(sizes.lmcSize, unit),
      sizeTolerance: roundLength(sizeTolerance, unit),
      virtualCondition: boundaries.virtualCondition === null ? null : roundLength(boundaries.virtualCondition, unit),
      resultantCondition: boundaries.resultantCondition === null ? null : roundLength(boundaries.resultantCondition, unit),
      innerBoundary: roundLength(boundaries.innerBoundary, unit),
      outerBoundary: roundLength(boundaries.outerBoundary, unit),
      maxBonus: roundLength(maxBonus, unit),
      bonusTable: bonusTable(modifier, sizes, tolerance, unit),
    };
    return { outputs, warnings, steps };
  },
});
