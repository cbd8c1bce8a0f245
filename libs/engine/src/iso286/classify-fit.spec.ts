import { describe, expect, it } from 'vitest';
import { classifyFit } from './classify-fit.js';

const um = (value: number) => value * 100;
const limits = (upper: number, lower: number) => ({ upper: um(upper), lower: um(lower) });

describe('classifyFit', () => {
  it('computes max clearance ES − ei and min clearance EI − es [C definitions: ISO 286-1 clause 3]', () => {
    expect(classifyFit(limits(15, 0), limits(-5, -14))).toEqual({ maxClearance: um(29), minClearance: um(5), fitType: 'clearance' });
  });

  it('calls a zero minimum clearance a clearance fit (H7/h6) and a zero maximum clearance an interference fit (H7/p6 at 10 mm) [D]', () => {
    expect(classifyFit(limits(21, 0), limits(0, -13)).fitType).toBe('clearance');
    expect(classifyFit(limits(15, 0), limits(24, 15))).toEqual({ maxClearance: 0, minClearance: um(-24), fitType: 'interference' });
  });

  it('calls a fit that can go either way transition (H7/k6 at 50 mm) [D]', () => {
    expect(classifyFit(limits(25, 0), limits(18, 2))).toEqual({ maxClearance: um(23), minClearance: um(-18), fitType: 'transition' });
  });
});
