import { iso2768InputSchema, type Iso2768LinearClass } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';
import { defineMethod } from '../core/method.js';
import { formatNumber } from '../core/units.js';
import { linearDeviations, radiusChamferDeviations } from './tables/general-tolerance-tables.js';
import { findGeneralToleranceRow, rowRangeText } from './find-general-tolerance-row.js';
import { lengthFromMicrometres, lengthInMm, rangeInUnit } from './length-from-micrometres.js';
import { resolveToleranceClass } from './resolve-tolerance-class.js';

export interface Iso2768Outputs {
  toleranceClass: Iso2768LinearClass;
  feature: 'linear' | 'radius-chamfer';
  upperDeviation: number;
  lowerDeviation: number;
  maxSize: number;
  minSize: number;
  sizeRange: { over: number; upTo: number | null };
}

const classNames: Record<Iso2768LinearClass, string> = { f: 'fine', m: 'medium', c: 'coarse', v: 'very coarse' };

export const iso2768Method = defineMethod({
  id: 'iso2768',
  version: 1,
  title: 'General tolerances for linear sizes (ISO 2768-1)',
  description:
    'Permissible deviations of a linear size without an individual tolerance (ISO 2768-1 Table 1), or of an external radius or ' +
    'chamfer height (Table 2), for class f, m, c or v given directly or as the title-block note (such as "ISO 2768-mK"). ' +
    'Sizes below 0.5 mm have no general tolerance: their deviation must be stated beside the size. The geometric classes ' +
    'H, K and L of ISO 2768-2 are the iso2768-geometric method; angles are iso2768-angular.',
  references: [
    'ISO 2768-1:1989, General tolerances — Part 1: Tolerances for linear and angular dimensions without individual tolerance indications, Tables 1 and 2',
  ],
  cautions: ['General tolerances apply only where the drawing refers to ISO 2768 and gives no individual tolerance; a functional fit needs an individual tolerance (ISO 286).'],
  inputSchema: iso2768InputSchema,
  outputs: [
    { name: 'toleranceClass', label: 'Tolerance class', kind: 'text', description: 'f, m, c or v.' },
    { name: 'feature', label: 'Feature', kind: 'text', description: 'linear size or radius/chamfer height.' },
    { name: 'upperDeviation', label: 'Upper deviation', kind: 'length', description: 'Permissible deviation above the nominal size.' },
    { name: 'lowerDeviation', label: 'Lower deviation', kind: 'length', description: 'Permissible deviation below the nominal size (negative).' },
    { name: 'maxSize', label: 'Maximum size', kind: 'length', description: 'Nominal size plus the upper deviation.' },
    { name: 'minSize', label: 'Minimum size', kind: 'length', description: 'Nominal size plus the lower deviation.' },
    { name: 'sizeRange', label: 'Size range', kind: 'object', description: 'The table range (over, up to and including; null: no upper bound), in the request unit.' },
  ],
  evaluate(inputs, { unit }) {
    const { toleranceClass, envelope } = resolveToleranceClass<Iso2768LinearClass>(inputs, 'linear');
    const sizeMm = lengthInMm(inputs.nominalSize, unit);
    const radius = inputs.feature === 'radius-chamfer';
    const table = radius ? radiusChamferDeviations : linearDeviations;
    const what = radius ? 'radius or chamfer height' : 'linear size';

    if (sizeMm < 0.5) {
      throw new EngineError('NOT_DEFINED_BY_STANDARD', 'No general tolerance below 0.5 mm', {
        nominalSize: `ISO 2768-1 gives no general tolerance for a ${what} below 0.5 mm: state the deviation beside the size`,
      });
    }
    const row = findGeneralToleranceRow(table, sizeMm);
    if (!row) {
      throw new EngineError('NOT_DEFINED_BY_STANDARD', 'Size above ISO 2768-1', {
        nominalSize: 'ISO 2768-1 gives general tolerances for linear sizes only up to 4000 mm: give an individual tolerance',
      });
    }
    const isFirst = table.rows.indexOf(row) === 0;
    const rangeText = rowRangeText(row, table.firstIncludesOver, isFirst);
    const deviation = row.values[toleranceClass];
    if (deviation === null) {
      throw new EngineError('NOT_DEFINED_BY_STANDARD', `Class ${toleranceClass} not defined for this size`, {
        [inputs.designation?.trim() ? 'designation' : 'class']: `ISO 2768-1 defines no class ${toleranceClass} (${classNames[toleranceClass]}) tolerance for ${rangeText}: give an individual tolerance`,
      });
    }

    const upperDeviation = lengthFromMicrometres(deviation, unit);
    const lowerDeviation = lengthFromMicrometres(-deviation, unit);
    const maxSize = Number((inputs.nominalSize + upperDeviation).toFixed(9));
    const minSize = Number((inputs.nominalSize + lowerDeviation).toFixed(9));
    const unitLatex = unit === 'mm' ? '\\,\\text{mm}' : '\\,\\text{in}';
    const nominal = formatNumber(inputs.nominalSize, 9);
    const warnings = envelope
      ? ['The designation ends in -E: the envelope requirement (ISO 8015 / ISO 14405-1 Ⓔ) applies to every single feature of size.']
      : [];

    return {
      outputs: {
        toleranceClass, feature: inputs.feature, upperDeviation, lowerDeviation, maxSize, minSize, sizeRange: rangeInUnit(row, unit),
      } satisfies Iso2768Outputs,
      warnings,
      steps: [
        {
          label: 'Tolerance class',
          latex: `\\text{ISO 2768-1 class } ${toleranceClass}\\ (\\text{${classNames[toleranceClass]}})`,
          value: inputs.designation?.trim() ? `${toleranceClass} from "${inputs.designation.trim()}"` : toleranceClass,
        },
        {
          label: `Size range (${radius ? 'Table 2, radii and chamfers' : 'Table 1, linear sizes'})`,
          latex: unit === 'mm' ? `D = ${formatNumber(sizeMm, 9)}\\,\\text{mm}` : `D = ${nominal}\\,\\text{in} \\times 25.4 = ${formatNumber(sizeMm, 9)}\\,\\text{mm}`,
          value: rangeText,
        },
        {
          label: 'Permissible deviation',
          latex: `\\pm ${formatNumber(deviation / 1000, 3)}\\,\\text{mm}`,
          value: `±${formatNumber(Math.abs(upperDeviation), 9)} ${unit}`,
        },
        {
          label: 'Limits',
          latex: `D_{max} = ${nominal} + ${formatNumber(upperDeviation, 9)} = ${formatNumber(maxSize, 9)}${unitLatex},\\quad D_{min} = ${nominal} - ${formatNumber(upperDeviation, 9)} = ${formatNumber(minSize, 9)}${unitLatex}`,
          value: `${formatNumber(minSize, 9)} to ${formatNumber(maxSize, 9)} ${unit}`,
        },
      ],
    };
  },
});
