import { fastenerFloatingInputSchema, type DerivationStep, type FastenerQuantity } from '@limitbook/contracts';
import { lengthText } from '../boundary/length-text.js';
import { defineMethod } from '../core/method.js';
import { formatLength, roundLength } from '../core/units.js';
import { solveFloating } from './solve-floating.js';

export type FastenerFloatingOutputs = {
  solvedFor: FastenerQuantity;
  holeSize: number;
  fastenerSize: number;
  positionTolerance: number;
};

export const fastenerFloatingMethod = defineMethod({
  id: 'fastener-floating',
  version: 1,
  title: 'Floating fastener: clearance holes in both parts',
  description:
    'Bolt or screw passing through clearance holes in both parts, held by a nut: each part may take the whole clearance between ' +
    'the hole at MMC and the fastener at MMC as its position tolerance at MMC, T = H − F. Give two of hole size (MMC of the ' +
    'clearance hole), fastener size (MMC of the fastener) and position tolerance (a diameter at MMC, for each part); the one left empty is solved for.',
  references: ['ASME Y14.5-2018, Nonmandatory Appendix B (formulas for positional tolerancing), floating fastener case', 'ASME Y14.5M-1994, Appendix B'],
  cautions: [
    'Assumes the position tolerance applies at MMC on both parts, each part with the same hole size and tolerance, and no allowance for fastener runout or head clearance beyond the hole.',
  ],
  inputSchema: fastenerFloatingInputSchema,
  outputs: [
    { name: 'solvedFor', label: 'Solved for', kind: 'text', description: 'Which of holeSize, fastenerSize and positionTolerance was left empty and computed.' },
    { name: 'holeSize', label: 'Hole size (MMC)', kind: 'length', description: 'Smallest clearance hole, H.' },
    { name: 'fastenerSize', label: 'Fastener size (MMC)', kind: 'length', description: 'Largest fastener, F.' },
    { name: 'positionTolerance', label: 'Position tolerance at MMC', kind: 'length', description: 'Diameter zone for the holes of each part, T.' },
  ],
  evaluate(inputs, { unit }) {
    const solution = solveFloating(inputs);
    const len = (value: number) => formatLength(value, unit);
    const { holeSize: H, fastenerSize: F, positionTolerance: T } = solution;
    const solvedStep: Record<FastenerQuantity, DerivationStep> = {
      positionTolerance: { label: 'Position tolerance', latex: `T = H - F = ${len(H)} - ${len(F)} = ${len(T)}`, value: lengthText(T, unit) },
      holeSize: { label: 'Hole size at MMC', latex: `H = F + T = ${len(F)} + ${len(T)} = ${len(H)}`, value: lengthText(H, unit) },
      fastenerSize: { label: 'Fastener size at MMC', latex: `F = H - T = ${len(H)} - ${len(T)} = ${len(F)}`, value: lengthText(F, unit) },
    };
    const steps: DerivationStep[] = [
      { label: 'Floating fastener condition', latex: 'T = H - F', value: `solved for ${solution.solvedFor}` },
      solvedStep[solution.solvedFor],
    ];
    const warnings: string[] = [];
    if (roundLength(T, unit) === 0) {
      warnings.push('Zero position tolerance at MMC: the parts assemble only through bonus tolerance as the holes depart from MMC.');
    }
    const outputs: FastenerFloatingOutputs = {
      solvedFor: solution.solvedFor,
      holeSize: roundLength(H, unit),
      fastenerSize: roundLength(F, unit),
      positionTolerance: roundLength(T, unit),
    };
    return { outputs, warnings, steps };
  },
});
