import { designDefinitionSchema } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { compareDefinitions } from './compare-definitions.js';

const base = designDefinitionSchema.parse({
  name: 'Squeeze',
  inputs: [{ name: 'cord', label: 'Cord', kind: 'length', unit: 'mm', default: 3.53 }],
  outputs: [{ name: 'squeeze', label: 'Squeeze', expression: '100 * (cord - 2.8 mm) / cord', unit: '' }],
  checks: [{ expression: 'squeeze >= 15', message: 'At least 15 %' }],
  references: ['ORD 5700'],
  tests: [{ inputs: { cord: 3.53 }, expected: { squeeze: { value: 20.68 } } }],
});

describe('compareDefinitions', () => {
  it('finds nothing between equal definitions, whatever the key order', () => {
    const reversed = (value: unknown): unknown =>
      Array.isArray(value)
        ? value.map(reversed)
        : value && typeof value === 'object'
          ? Object.fromEntries(Object.entries(value).reverse().map(([key, entry]) => [key, reversed(entry)]))
          : value;
    expect(compareDefinitions(base, reversed(base) as typeof base)).toEqual([]);
  });

  it('reports each changed setting with before and after, and a word diff of expressions', () => {
    const changed = designDefinitionSchema.parse({
      ...base,
      name: 'Cord squeeze',
      inputs: [{ ...base.inputs[0], unit: 'in', default: 0.139 }, { name: 'depth', label: 'Depth', kind: 'length', unit: 'mm', default: 2.8 }],
      outputs: [{ ...base.outputs[0], expression: '100 * (cord - depth) / cord' }],
      checks: [],
      tests: [{ ...base.tests[0], expected: { squeeze: { value: 20.7, tolerance: 0.1 } } }],
    });
    const changes = compareDefinitions(base, changed);
    expect(changes.map((change) => [change.section, change.key, change.change])).toEqual([
      ['general', 'name', 'changed'],
      ['inputs', 'cord', 'changed'],
      ['inputs', 'depth', 'added'],
      ['outputs', 'squeeze', 'changed'],
      ['checks', '#1', 'removed'],
      ['tests', '#1', 'changed'],
    ]);
    expect(changes[1]!.rows).toEqual([
      { field: 'unit', from: 'mm', to: 'in' },
      { field: 'default', from: '3.53', to: '0.139' },
    ]);
    expect(changes[3]!.text).toEqual([
      { kind: 'unchanged', text: '100 * (cord - ' },
      { kind: 'removed', text: '2.8 mm' },
      { kind: 'added', text: 'depth' },
      { kind: 'unchanged', text: ') / cord' },
    ]);
    expect(changes[5]!.rows).toEqual([{ field: 'expected', from: '{"squeeze":{"tolerance":0,"value":20.68}}', to: '{"squeeze":{"tolerance":0.1,"value":20.7}}' }]);
  });
});
