import { describe, expect, it } from 'vitest';
import { definitionFieldPaths, definitionKey, definitionProblems, emptyDefinition, newInput, renameInTests, unplacedProblems } from './definition';

describe('definitionProblems', () => {
  it('drops the definition prefix of save and preview bodies so messages land on the form fields', () => {
    expect(definitionProblems({ 'definition.outputs.0.expression': 'Unknown name d', 'inputs.1.unit': 'Not a length unit' })).toEqual({
      'outputs.0.expression': 'Unknown name d',
      'inputs.1.unit': 'Not a length unit',
    });
  });
});

describe('unplacedProblems', () => {
  it('lists only messages no field shows; test rows have their own place', () => {
    const definition = { ...emptyDefinition('Squeeze'), inputs: [newInput(0)] };
    const shown = definitionFieldPaths(definition);
    expect(unplacedProblems({ 'inputs.0.unit': 'x', 'tests.0': 'row fails', values: 'Bad values' }, shown)).toEqual(['values: Bad values']);
  });
});

describe('definitionKey', () => {
  it('ignores the order of keys', () => {
    expect(definitionKey({ a: 1, b: { c: 2, d: 3 } })).toBe(definitionKey({ b: { d: 3, c: 2 }, a: 1 }));
  });
});

describe('renameInTests', () => {
  it('carries the typed values over to the new name', () => {
    const rows = [{ label: '', inputs: { d: 2, h: 1 }, expected: {}, expectedVerdict: null }];
    expect(renameInTests(rows, 'inputs', 'd', 'd_cord')[0]?.inputs).toEqual({ d_cord: 2, h: 1 });
  });
});
