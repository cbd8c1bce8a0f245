import { iso2768AngularInputSchema, type Iso2768LinearClass } from '@limitbook/contracts';
import { defineMethod } from '../core/method.js';
import { formatNumber } from '../core/units.js';
import { angularDeviations } from './tables/general-tolerance-tables.js';
import { findGeneralToleranceRow, rowRangeText } from './find-general-tolerance-row.js';
import { lengthInMm, rangeInUnit } from './length-from-micrometres.js';
import { resolveToleranceClass } from './resolve-tolerance-class.js';

export interface Iso2768AngularOutputs {
  toleranceClass: Iso2768LinearClass;
  /** ± deviation in arc minutes (exact). */
  deviationMinutes: number;
  /** ± deviation in decimal degrees. */
  deviationDegrees: number;
  /** As a drawing writes it: "±0°30′". */
  deviationText: string;
  sizeRange: { over: number; upTo: number | null };
}

export function degreesMinutesText(minutes: number): string {
  return `${Math.floor(minutes / 60)}°${minutes % 60 === 0 ? '' : `${minutes % 60}′`}`;
}

export const iso2768AngularMethod = defineMethod({
  id: 'iso2768-angular',
  version: 1,
  title: 'General tolerances for angles (ISO 2768-1)',
  description:
    'Permissible deviation of an angle without an individual tolerance, by the length of its shorter leg (ISO 2768-1 Table 3), ' +
    'for class f, m, c or v or the title-block note (such as "ISO 2768-mK"). The deviation limits the general direction of the ' +
    'lines (the angle of the contact lines), not their form.',
  references: ['ISO 2768-1:1989, Table 3 — Permissible deviations of angular dimensions'],
  cautions: ['For class v above 400 mm the value (±0°20′) is from memory of the standard; confirm it against your copy before relying on it.'],
  inputSchema: iso2768AngularInputSchema,
  outputs: [
    { name: 'toleranceClass', label: 'Tolerance class', kind: 'text', description: 'f, m, c or v.' },
    { name: 'deviationMinutes', label: 'Deviation (arc minutes)', kind: 'number', description: '± permissible deviation in minutes of arc.' },
    { name: 'deviationDegrees', label: 'Deviation (degrees)', kind: 'number', description: '± permissible deviation in decimal degrees.' },
    { name: 'deviationText', label: 'Deviation', kind: 'text', description: 'As written on a drawing, e.g. ±0°30′.' },
    { name: 'sizeRange', label: 'Shorter-leg range', kind: 'object', description: 'Over, up to and including (null: no upper bound), in the request unit.' },
  ],
  evaluate(inputs, { unit }) {
    const { toleranceClass } = resolveToleranceClass<Iso2768LinearClass>(inputs, 'linear');
    const legMm = lengthInMm(inputs.shorterLegLength, unit);
    const row = findGeneralToleranceRow(angularDeviations, legMm);
    // Every positive length has a row: the last one has no upper bound; every class has a value.
    const minutes = row?.values[toleranceClass] as number;
    const rangeText = row ? rowRangeText(row, false, false) : '';
    const deviationText = `±${degreesMinutesText(minutes)}`;
    return {
      outputs: {
        toleranceClass,
        deviationMinutes: minutes,
        deviationDegrees: Number((minutes / 60).toFixed(9)),
        deviationText,
        sizeRange: rangeInUnit(row ?? { over: 0, upTo: null }, unit),
      } satisfies Iso2768AngularOutputs,
      warnings: toleranceClass === 'v' && row?.upTo === null ? ['Class v above 400 mm (±0°20′) is from memory of ISO 2768-1 Table 3: confirm against the standard.'] : [],
      steps: [
        { label: 'Shorter leg', latex: `l = ${formatNumber(legMm, 9)}\\,\\text{mm}`, value: rangeText },
        { label: `Permissible deviation, class ${toleranceClass}`, latex: `\\pm ${minutes}' = \\pm ${formatNumber(minutes / 60, 6)}^{\\circ}`, value: deviationText },
      ],
    };
  },
});
