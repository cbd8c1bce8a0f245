import type { EvaluationResult } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { deriveEvaluationView } from './evaluation-state';

const result = (minWall: number): EvaluationResult => ({ method: 'wall-thickness', version: 1, unit: 'mm', outputs: { minWall }, warnings: [], steps: [] });
const refused = { statusCode: 400, code: 'VALIDATION_FAILED' as const, message: 'Some inputs are not valid for this method.', fields: { 'inputs.feature.lowerLimit': 'Too big' } };

describe('deriveEvaluationView', () => {
  it('shows a result as current only when it answers the inputs on screen', () => {
    const first = result(4.8);
    expect(deriveEvaluationView({ requestKey: 'a', askedKey: 'a', running: false, outcome: { ok: true, result: first }, failure: null, lastGood: null })).toEqual({
      state: 'current',
      result: first,
      stale: false,
      error: null,
    });
  });

  it('marks the previous result stale while new inputs wait for the debounce or the server', () => {
    const lastGood = { key: 'a', result: result(4.8) };
    const debouncing = deriveEvaluationView({ requestKey: 'b', askedKey: 'a', running: false, outcome: { ok: true, result: lastGood.result }, failure: null, lastGood });
    expect(debouncing).toMatchObject({ state: 'updating', stale: true, result: lastGood.result });
    const fetching = deriveEvaluationView({ requestKey: 'b', askedKey: 'b', running: true, outcome: undefined, failure: null, lastGood });
    expect(fetching).toMatchObject({ state: 'updating', stale: true, result: lastGood.result });
  });

  it('shows a refusal as an error and keeps the last good result only as out of date', () => {
    const lastGood = { key: 'a', result: result(4.8) };
    const view = deriveEvaluationView({ requestKey: 'b', askedKey: 'b', running: false, outcome: { ok: false, error: refused }, failure: null, lastGood });
    expect(view).toEqual({ state: 'error', result: lastGood.result, stale: true, error: refused });
    expect(deriveEvaluationView({ requestKey: 'b', askedKey: 'b', running: false, outcome: { ok: false, error: refused }, failure: null, lastGood: null })).toEqual({
      state: 'error',
      result: null,
      stale: false,
      error: refused,
    });
  });

  it('treats a network failure like a refusal and waits with nothing to show on the first load', () => {
    const failure = { statusCode: 0, code: 'INTERNAL' as const, message: 'Cannot reach the server' };
    expect(deriveEvaluationView({ requestKey: 'a', askedKey: 'a', running: false, outcome: undefined, failure, lastGood: null })).toMatchObject({ state: 'error', error: failure });
    expect(deriveEvaluationView({ requestKey: 'a', askedKey: 'a', running: true, outcome: undefined, failure: null, lastGood: null })).toEqual({
      state: 'loading',
      result: null,
      stale: false,
      error: null,
    });
  });
});
