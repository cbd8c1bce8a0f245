import type { EvaluationResult } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { EngineError } from './engine-error.js';
import { judgeAcceptance } from './judge-acceptance.js';

const wallResult: EvaluationResult = {
  method: 'wall-thickness',
  version: 1,
  unit: 'mm',
  outputs: { minWall: 1.6, sweep: { featureSizes: [] }, ratio: { value: 20.68, unit: '' } },
  warnings: [],
  steps: [],
};

describe('judgeAcceptance', () => {
  it('passes a limit equal to the value and fails one above it', () => {
    expect(judgeAcceptance(wallResult, { output: 'minWall', operator: '>=', value: 1.6 }).verdict?.pass).toBe(true);
    const failed = judgeAcceptance(wallResult, { output: 'minWall', operator: '>=', value: 1.61, unit: 'mm' }).verdict;
    expect(failed).toMatchObject({ pass: false, summary: 'Fails the rule minWall ≥ 1.61 mm' });
    expect(failed?.checks[0]).toEqual({ label: 'Acceptance rule: minWall ≥ 1.61 mm', pass: false, detail: 'minWall = 1.6 mm' });
  });

  it('converts a limit written in mm to a result in inches (25.4 mm per inch by definition)', () => {
    const inInches = { ...wallResult, unit: 'in' as const, outputs: { minWall: 0.063 } };
    // 1.6 mm = 0.06299 in: passes ≥ 1.6 mm; 0.063 in = 1.6002 mm fails ≤ 1.6 mm.
    expect(judgeAcceptance(inInches, { output: 'minWall', operator: '>=', value: 1.6, unit: 'mm' }).verdict?.pass).toBe(true);
    expect(judgeAcceptance(inInches, { output: 'minWall', operator: '<=', value: 1.6, unit: 'mm' }).verdict?.pass).toBe(false);
  });

  it('judges ranges, strict comparisons and formula outputs', () => {
    expect(judgeAcceptance(wallResult, { output: 'minWall', operator: 'between', value: 1.5, value2: 1.6 }).verdict?.pass).toBe(true);
    expect(judgeAcceptance(wallResult, { output: 'minWall', operator: '>', value: 1.6 }).verdict?.pass).toBe(false);
    expect(judgeAcceptance(wallResult, { output: 'ratio', operator: '<', value: 30 }).verdict?.pass).toBe(true);
  });

  it('keeps the method checks and fails the block when one of them fails', () => {
    const withMethodVerdict: EvaluationResult = {
      ...wallResult,
      verdict: { pass: false, summary: 'Stack outside spec', checks: [{ label: 'Worst case within spec', pass: false, detail: '2.77 < 2.8' }] },
    };
    const verdict = judgeAcceptance(withMethodVerdict, { output: 'minWall', operator: '>=', value: 1 }).verdict;
    expect(verdict?.pass).toBe(false);
    expect(verdict?.checks.map((check) => check.pass)).toEqual([true, false]);
  });

  it('refuses a rule on an output that is missing or not a number', () => {
    expect(() => judgeAcceptance(wallResult, { output: 'minWal', operator: '>=', value: 1 })).toThrow(EngineError);
    expect(() => judgeAcceptance(wallResult, { output: 'sweep', operator: '>=', value: 1 })).toThrow(/no numeric output "sweep"/);
    expect(() => judgeAcceptance(wallResult, { output: 'minWall.constructor', operator: '>=', value: 1 })).toThrow(EngineError);
  });
});
