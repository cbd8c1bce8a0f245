import { describe, expect, it } from 'vitest';
import { acceptanceRuleSchema } from './acceptance.js';
import { batchEvaluateRequestSchema, evaluateRequestSchema, maxBatchItems } from './evaluation.js';

describe('evaluation contracts', () => {
  it('defaults the unit to mm and refuses other units', () => {
    expect(evaluateRequestSchema.parse({ inputs: {} }).unit).toBe('mm');
    expect(evaluateRequestSchema.safeParse({ inputs: {}, unit: 'cm' }).success).toBe(false);
  });

  it(`bounds a batch to 1–${maxBatchItems} items`, () => {
    const item = { method: 'iso286-fit', inputs: { nominalSize: 10, hole: 'H7' } };
    expect(batchEvaluateRequestSchema.safeParse({ items: [] }).success).toBe(false);
    expect(batchEvaluateRequestSchema.safeParse({ items: Array(maxBatchItems).fill(item) }).success).toBe(true);
    expect(batchEvaluateRequestSchema.safeParse({ items: Array(maxBatchItems + 1).fill(item) }).success).toBe(false);
  });

  it('needs an ordered pair of limits for a between rule and only then', () => {
    expect(acceptanceRuleSchema.safeParse({ output: 'endPlay', operator: 'between', value: 0.05, value2: 0.25, unit: 'mm' }).success).toBe(true);
    expect(acceptanceRuleSchema.safeParse({ output: 'endPlay', operator: 'between', value: 0.25, value2: 0.05 }).success).toBe(false);
    expect(acceptanceRuleSchema.safeParse({ output: 'minWall', operator: '>=', value: 1.5, value2: 2 }).success).toBe(false);
    expect(acceptanceRuleSchema.safeParse({ output: 'minWall.constructor()', operator: '>=', value: 1 }).success).toBe(false);
  });
});
