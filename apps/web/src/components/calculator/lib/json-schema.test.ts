import { describe, expect, it } from 'vitest';
import { describeInputs, hasLengthInput, type JsonSchema } from './json-schema';

// The shape the server gives an in-house method's inputs: the author's labels and units, no lengths in the request unit.
const houseSchema: JsonSchema = {
  type: 'object',
  properties: {
    Ehub: { type: 'number', title: 'Hub modulus E', description: 'Young’s modulus of the hub [GPa]', default: 210, minimum: 1 },
    cord: { type: 'number', title: 'Cord diameter', description: 'O-ring cross-section [mm]', default: 3.53 },
  },
  required: ['Ehub', 'cord'],
};

const wallSchema: JsonSchema = {
  type: 'object',
  properties: { basicDistance: { type: 'number' }, featureType: { type: 'string', enum: ['internal', 'external'] } },
  required: ['basicDistance'],
};

describe('describeInputs', () => {
  it('labels a field with the title the method states, before any name-derived label', () => {
    const fields = describeInputs(houseSchema, 'house:press-fit');
    expect(fields.map((field) => field.label)).toEqual(['Hub modulus E', 'Cord diameter']);
  });

  it('keeps the built-in labels where the schema has no title', () => {
    expect(describeInputs(wallSchema, 'wall-thickness')[0]?.label).toBe('Basic distance');
  });
});

describe('hasLengthInput', () => {
  it('offers the mm/inch switch only for methods whose numbers are lengths', () => {
    expect(hasLengthInput(describeInputs(wallSchema, 'wall-thickness'))).toBe(true);
    expect(hasLengthInput(describeInputs(houseSchema, 'house:press-fit'))).toBe(false);
  });
});
