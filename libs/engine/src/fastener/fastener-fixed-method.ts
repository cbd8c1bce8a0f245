import { fastenerFixedInputSchema, type DerivationStep, type FastenerQuantity } from '@limitbook/contracts';
import { lengthText } from '../boundary/length-text.js';
import { defineMethod } from '../core/method.js';
import { formatLength, formatNumber, roundLength, roundTo } from '../core/units.js';
import { solveFixed } from './solve-fixed.js';

export type FastenerFixedOutputs = {
  solvedFor: FastenerQuantity;
  holeSize: number;
  fastenerSize: number;
  positionTolerance: number;
  toleranceThreaded: number;
  projectedZone: boolean;
  projectionFactor: number;
};

export const fastenerFixedMethod = defineMethod({
  id: 'fastener-fixed',
  version: 1,
  title: 'Fixed fastener: clearance hole in one part, fastener held in the other',
  description:
    'Screw, stud or pin held in one part (threaded or press-fit) passing through a clearance hole in the other: H = F + T1 + T2, with ' +
    'T1 the clearance-hole part’s position tolerance at MMC and T2 the fixed part’s, split equally (T1 = T2 = (H − F)/2) unless T2 is given. ' +
    'The fixed part is taken to carry a projected tolerance zone; where it does not, give the projection P and the engagement depth D and ' +
    'the fixed part’s tolerance counts (1 + 2P/D) times: H = F + T1 + T2(1 + 2P/D). Give two of hole size, fastener size and T1; the one left empty is solved for.',
  references: ['ASME Y14.5-2018, Nonmandatory Appendix B (formulas for positional tolerancing), fixed fastener case', 'ASME Y14.5M-1994, Appendix B'],
  cautions: [
    'With a projected tolerance zone the zone height should be at least the maximum thickness of the part with the clearance hole (or the stud projection).',
    'Assumes position at MMC on both parts; fastener runout, thread pitch-diameter float and head clearance are not included.',
  ],
  inputSchema: fastenerFixedInputSchema,
  outputs: [
    { name: 'solvedFor', label: 'Solved for', kind: 'text', description: 'Which of holeSize, fastenerSize and positionTolerance was left empty and computed.' },
    { name: 'holeSize', label: 'Hole size (MMC)', kind: 'length', description: 'Smallest clearance hole, H.' },
    { name: 'fastenerSize', label: 'Fastener size (MMC)', kind: 'length', description: 'Largest fastener, F.' },
    { name: 'positionTolerance', label: 'Clearance-hole part tolerance T1', kind: 'length', description: 'Position tolerance at MMC of the clearance holes.' },
    { name: 'toleranceThreaded', label: 'Fixed part tolerance T2', kind: 'length', description: 'Position tolerance at MMC of the threaded or press-fit holes.' },
    { name: 'projectedZone', label: 'Projected tolerance zone', kind: 'boolean', description: 'True when no projection and engagement depth were given, so the fixed part is taken to carry a projected zone.' },
    { name: 'projectionFactor', label: 'Projection factor', kind: 'number', description: '1 with a projected zone, 1 + 2P/D without.' },
  ],
  evaluate(inputs, { unit }) {
    const solution = solveFixed(inputs);
    const len = (value: number) => formatLength(value, unit);
    const { holeSize: H, fastenerSize: F, positionTolerance: T1, toleranceThreaded: T2, projectionFactor: k } = solution;
    const projectedZone = typeof inputs.projection !== 'number';
    const kText = formatNumber(k, 4);
    const steps: DerivationStep[] = [
      projectedZone
        ? { label: 'Projection factor', latex: 'k = 1\\quad(\\text{projected tolerance zone on the fixed part})', value: '1' }
        : {
            label: 'Projection factor',
            latex: `k = 1 + \\tfrac{2P}{D} = 1 + \\tfrac{2 \\cdot ${len(inputs.projection as number)}}{${len(inputs.engagementDepth as number)}} = ${kText}`,
            value: kText,
          },
      { label: 'Fixed fastener condition', latex: 'H = F + T_1 + k\\,T_2', value: `solved for ${solution.solvedFor}` },
    ];
    if (solution.equalSplit) steps.push({ label: 'Equal split', latex: 'T_2 = T_1', value: 'T2 not given' });
    const kTimes = (value: number) => (k === 1 ? len(value) : `${kText} \\cdot ${len(value)}`);
    switch (solution.solvedFor) {
      case 'positionTolerance':
        steps.push(
          solution.equalSplit
            ? { label: 'Position tolerances', latex: `T_1 = T_2 = \\tfrac{H - F}{1 + k} = \\tfrac{${len(H)} - ${len(F)}}{1 + ${kText}} = ${len(T1)}`, value: lengthText(T1, unit) }
            : { label: 'Clearance-hole part tolerance', latex: `T_1 = H - F - k\\,T_2 = ${len(H)} - ${len(F)} - ${kTimes(T2)} = ${len(T1)}`, value: lengthText(T1, unit) },
        );
        break;
      case 'holeSize':
        steps.push({ label: 'Hole size at MMC', latex: `H = ${len(F)} + ${len(T1)} + ${kTimes(T2)} = ${len(H)}`, value: lengthText(H, unit) });
        break;
      case 'fastenerSize':
        steps.push({ label: 'Fastener size at MMC', latex: `F = H - T_1 - k\\,T_2 = ${len(H)} - ${len(T1)} - ${kTimes(T2)} = ${len(F)}`, value: lengthText(F, unit) });
        break;
    }
    const warnings: string[] = [];
    if (!projectedZone) {
      warnings.push(`Without a projected tolerance zone the fixed part’s tolerance counts ${kText} times; a projected zone on the fixed part would let it count once.`);
    }
    if (roundLength(T1, unit) === 0 && roundLength(T2, unit) === 0) {
      warnings.push('Zero position tolerance at MMC: the parts assemble only through bonus tolerance as the features depart from MMC.');
    }
    const outputs: FastenerFixedOutputs = {
      solvedFor: solution.solvedFor,
      holeSize: roundLength(H, unit),
      fastenerSize: roundLength(F, unit),
      positionTolerance: roundLength(T1, unit),
      toleranceThreaded: roundLength(T2, unit),
      projectedZone,
      projectionFactor: roundTo(k, 6),
    };
    return { outputs, warnings, steps };
  },
});
