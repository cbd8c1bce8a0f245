import { describe, expect, it } from 'vitest';
import type { Field } from '@/components/calculator';
import { inputRows } from './input-rows';

const fields: Field[] = [
  { kind: 'number', path: 'positionTolerance', name: 'positionTolerance', label: 'Position tolerance', required: true, nullable: false, length: true, integer: false },
  {
    kind: 'object',
    path: 'datum',
    name: 'datum',
    label: 'Datum feature',
    required: true,
    nullable: false,
    fields: [{ kind: 'number', path: 'datum.lowerLimit', name: 'lowerLimit', label: 'Lower limit of size', required: true, nullable: false, length: true, integer: false }],
  },
];

describe('inputRows', () => {
  it('writes nested values out with the method labels, in the method\'s order, and marks lengths', () => {
    expect(inputRows({ datum: { featureType: 'external', lowerLimit: 29.9 }, positionTolerance: 0.2 }, fields)).toEqual([
      { path: 'positionTolerance', label: 'Position tolerance', value: '0.2', length: true },
      { path: 'datum.lowerLimit', label: 'Datum feature › Lower limit of size', value: '29.9', length: true },
      { path: 'datum.featureType', label: 'Datum feature › featureType', value: 'external', length: false },
    ]);
  });

  it('numbers table rows from one and keeps values without float noise', () => {
    const rows = inputRows({ contributors: [{ nominal: 0.1 + 0.2 }, { nominal: 5 }] }, []);
    expect(rows.map((row) => [row.label, row.value])).toEqual([
      ['contributors 1 › nominal', '0.3'],
      ['contributors 2 › nominal', '5'],
    ]);
  });
});
