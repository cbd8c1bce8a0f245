import { describe, expect, it } from 'vitest';
import { everyNodeDocument, sampleBlockIds } from '../testing/index.js';
import { listCalculatorBlocks } from './list-calculator-blocks.js';

const block = (blockId: string, caption: string) => ({ type: 'calculatorBlock', attrs: { blockId, method: 'iso286-fit', caption } });
const ids = ['11111111-1111-4111-8111-111111111111', '22222222-2222-4222-8222-222222222222', '33333333-3333-4333-8333-333333333333'];

describe('listCalculatorBlocks', () => {
  it('lists blocks in document order, nested ones where they stand', () => {
    const doc = {
      type: 'doc',
      content: [
        block(ids[2]!, 'first'),
        { type: 'table', content: [{ type: 'tableRow', content: [{ type: 'tableCell', content: [block(ids[0]!, 'second')] }] }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'between' }] },
        block(ids[1]!, 'third'),
      ],
    };
    expect(listCalculatorBlocks(doc).map((attrs) => [attrs.blockId, attrs.caption])).toEqual([
      [ids[2], 'first'],
      [ids[0], 'second'],
      [ids[1], 'third'],
    ]);
  });

  it('gives full attributes with defaults', () => {
    const [first, second] = listCalculatorBlocks(everyNodeDocument());
    expect(first).toMatchObject({ blockId: sampleBlockIds[0], method: 'wall-between-features', methodVersion: 2, locked: ['bore.diameter', 'contributors.0.tolerance'] });
    expect(second).toMatchObject({ blockId: sampleBlockIds[1], unit: 'in', acceptance: { operator: 'between', value: 0.002, value2: 0.01 } });
    expect(listCalculatorBlocks({ type: 'doc', content: [block(ids[0]!, '')] })[0]).toEqual({
      blockId: ids[0],
      method: 'iso286-fit',
      methodVersion: null,
      unit: 'mm',
      defaults: {},
      locked: [],
      acceptance: null,
      caption: '',
    });
  });

  it('throws on a block that was never validated', () => {
    expect(() => listCalculatorBlocks({ type: 'doc', content: [{ type: 'calculatorBlock', attrs: { blockId: 'x' } }] })).toThrow(/invalid attributes/);
  });
});
