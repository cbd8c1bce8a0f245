import { iso2768GeometricInputSchema, type Iso2768GeometricClass } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { defineMethod } from '../core/method.js';
import { formatNumber } from '../core/units.js';
import {
  circularRunOutTolerances,
  perpendicularityTolerances,
  straightnessFlatnessTolerances,
  symmetryTolerances,
  type GeneralToleranceTable,
} from './tables/general-tolerance-tables.js';
import { findGeneralToleranceRow, rowRangeText } from './find-general-tolerance-row.js';
import { lengthFromMicrometres, lengthInMm, rangeInUnit } from './length-from-micrometres.js';
import { resolveToleranceClass } from './resolve-tolerance-class.js';

export type Iso2768GeometricOutputs = {
  toleranceClass: Iso2768GeometricClass;
  characteristic: string;
  tolerance: number;
  /** The length range that selected the tolerance; null for circular run-out, which has one value per class. */
  sizeRange: { over: number; upTo: number | null } | null;
};

const tables: Record<'straightness' | 'flatness' | 'perpendicularity' | 'symmetry', { table: GeneralToleranceTable<Iso2768GeometricClass>; source: string; length: string }> = {
  straightness: { table: straightnessFlatnessTolerances, source: 'ISO 2768-2 Table 1', length: 'length of the line' },
  flatness: { table: straightnessFlatnessTolerances, source: 'ISO 2768-2 Table 1', length: 'longer side of the surface' },
  perpendicularity: { table: perpendicularityTolerances, source: 'ISO 2768-2 Table 2', length: 'shorter side' },
  symmetry: { table: symmetryTolerances, source: 'ISO 2768-2 Table 3', length: 'longer of the two features' },
};

export const iso2768GeometricMethod = defineMethod<typeof iso2768GeometricInputSchema, Iso2768GeometricOutputs>({
  id: 'iso2768-geometric',
  version: 1,
  title: 'General geometrical tolerances (ISO 2768-2)',
  description:
    'General tolerance of straightness, flatness, perpendicularity, symmetry or circular run-out for class H, K or L, given ' +
    'directly or as the title-block note (such as "ISO 2768-mK"). Straightness and flatness go by the length of the line or the ' +
    'longer side of the surface, perpendicularity by the shorter side, symmetry by the longer feature, up to 3000 mm; circular ' +
    'run-out has one value per class. Other characteristics follow from these and the size tolerance (ISO 2768-2 clause 4).',
  references: ['ISO 2768-2:1989, General tolerances — Part 2: Geometrical tolerances for features without individual tolerance indications, Tables 1 to 4'],
  cautions: ['The symmetry values (Table 3) are from memory of the standard; confirm them against your copy before relying on them.'],
  inputSchema: iso2768GeometricInputSchema,
  outputs: [
    { name: 'toleranceClass', label: 'Tolerance class', kind: 'text', description: 'H, K or L.' },
    { name: 'characteristic', label: 'Characteristic', kind: 'text', description: 'The geometric characteristic.' },
    { name: 'tolerance', label: 'Tolerance', kind: 'length', description: 'The general geometrical tolerance (zone width).' },
    { name: 'sizeRange', label: 'Length range', kind: 'object', description: 'The range that selected the tolerance, in the request unit; null for run-out.' },
  ],
  evaluate(inputs, { unit }) {
    const { toleranceClass } = resolveToleranceClass<Iso2768GeometricClass>(inputs, 'geometric');
    const { characteristic } = inputs;
    const warnings = characteristic === 'symmetry' ? ['ISO 2768-2 Table 3 (symmetry) values are from memory: confirm against the standard.'] : [];

    if (characteristic === 'circular-run-out') {
      const micrometres = circularRunOutTolerances[toleranceClass];
      const tolerance = lengthFromMicrometres(micrometres, unit);
      return {
        outputs: { toleranceClass, characteristic, tolerance, sizeRange: null } satisfies Iso2768GeometricOutputs,
        warnings,
        steps: [{ label: `Circular run-out, class ${toleranceClass} (ISO 2768-2 Table 4)`, latex: `t = ${formatNumber(micrometres / 1000, 3)}\\,\\text{mm}`, value: `${formatNumber(tolerance, 9)} ${unit}` }],
      };
    }

    const { table, source, length: lengthName } = tables[characteristic];
    const lengthMm = lengthInMm(inputs.length as number, unit);
    const row = findGeneralToleranceRow(table, lengthMm);
    if (!row) {
      throw new EngineError('NOT_DEFINED_BY_STANDARD', 'Length above ISO 2768-2', {
        length: `${source} goes only up to 3000 mm: give an individual ${characteristic} tolerance`,
      });
    }
    const micrometres = row.values[toleranceClass] as number;
    const tolerance = lengthFromMicrometres(micrometres, unit);
    return {
      outputs: { toleranceClass, characteristic, tolerance, sizeRange: rangeInUnit(row, unit) } satisfies Iso2768GeometricOutputs,
      warnings,
      steps: [
        { label: `Length (${lengthName})`, latex: `l = ${formatNumber(lengthMm, 9)}\\,\\text{mm}`, value: rowRangeText(row, false, false) },
        { label: `${characteristic[0]?.toUpperCase()}${characteristic.slice(1)}, class ${toleranceClass} (${source})`, latex: `t = ${formatNumber(micrometres / 1000, 3)}\\,\\text{mm}`, value: `${formatNumber(tolerance, 9)} ${unit}` },
      ],
    };
  },
});
