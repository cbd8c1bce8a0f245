import type { EvaluationResult } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { evaluateMethod } from '../registry.js';
import { formulaMethod } from './formula.method.js';

function failure(inputs: unknown): EngineError {
  try {
    evaluateMethod(formulaMethod, inputs, 'mm');
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
  throw new Error('expected an EngineError');
}

describe('formula method', () => {
  it('returns each assigned name with its unit, a step per expression and a verdict from the checks', () => {
    // Groove squeeze (3.53 − 2.8)/3.53 = 20.68 % (Parker O-Ring Handbook ORD 5700 definition of squeeze).
    const result: EvaluationResult = evaluateMethod(
      formulaMethod,
      {
        values: { cord: '3.53 mm', depth: 2.8 },
        expressions: ['depthMm = depth * 1 mm', 'squeeze = (cord - depthMm) / cord'],
        checks: [{ expression: 'squeeze >= 0.15', message: 'At least 15 % squeeze' }, 'squeeze <= 0.2'],
      },
      'in',
    );
    expect(result.outputs).toEqual({
      depthMm: { value: 2.8, unit: 'mm', text: '2.8 mm' },
      squeeze: { value: 0.206798866856, unit: null, text: '0.206799' },
    });
    expect(result.steps.map((step) => step.label)).toEqual(['depthMm', 'squeeze']);
    expect(result.verdict).toEqual({
      pass: false,
      summary: '1 of 2 checks hold',
      checks: [
        { label: 'At least 15 % squeeze', pass: true, detail: '0.206799 >= 0.15' },
        { label: 'squeeze <= 0.2', pass: false, detail: '0.206799 <= 0.2' },
      ],
    });
  });

  it('has no verdict without checks', () => {
    expect(evaluateMethod(formulaMethod, { expressions: ['a = 2 * 3'] }, 'mm').verdict).toBeUndefined();
  });

  it('answers refusals with FORMULA_REFUSED and a message at inputs.expressions.<i>', () => {
    const error = failure({ expressions: ['a = 1', 'b = import({})'] });
    expect(error.code).toBe('FORMULA_REFUSED');
    expect(error.fields).toEqual({ 'inputs.expressions.1': expect.stringMatching(/^Refused: objects are not allowed|^Refused: import\(\)/) });
  });

  it('validates the request shape per field before evaluating', () => {
    const error = failure({ expressions: ['a = 1', `b = ${'9'.repeat(600)}`], values: { x: {} }, checks: [42] });
    expect(error.code).toBe('INVALID_INPUT');
    expect(error.fields['inputs.expressions.1']).toMatch(/longer than 500 characters/);
    expect(error.fields['inputs.values.x']).toBeTruthy();
    expect(error.fields['inputs.checks.0']).toBeTruthy();
    expect(failure({ expressions: ['x = x + 1'] }).fields['inputs.expressions.0']).toBe('x cannot refer to itself');
  });
});
