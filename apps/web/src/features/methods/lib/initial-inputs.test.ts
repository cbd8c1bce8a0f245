import { describe, expect, it } from 'vitest';
import { describeInputs } from '@/components/calculator';
import { defaultsComplete, initialInputs } from './initial-inputs';

const schema = {
  type: 'object',
  properties: {
    arrangement: { type: 'string', enum: ['coaxial', 'side-by-side'] },
    feature: {
      type: 'object',
      properties: { featureType: { type: 'string', enum: ['internal', 'external'], default: 'internal' }, lowerLimit: { type: 'number' } },
      required: ['featureType', 'lowerLimit'],
    },
    trials: { type: 'integer', default: 100000 },
  },
  required: ['arrangement', 'feature'],
};

describe('initialInputs', () => {
  it('takes schema defaults, the first option of a required choice, and nests objects', () => {
    expect(initialInputs(describeInputs(schema))).toEqual({ arrangement: 'coaxial', feature: { featureType: 'internal' }, trials: 100000 });
  });

  it('says the defaults are incomplete while a required number is missing', () => {
    const fields = describeInputs(schema);
    expect(defaultsComplete(fields, initialInputs(fields))).toBe(false);
    expect(defaultsComplete(fields, { arrangement: 'coaxial', feature: { featureType: 'internal', lowerLimit: 19.9 } })).toBe(true);
  });
});
