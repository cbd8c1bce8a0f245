import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { evaluateFormulaSet } from './evaluate-formula-set.js';
import { harmlessErrorFormulaExpressions as harmlessErrors, refusedFormulaExpressions as refused } from './hostile-expressions.js';
import { sandboxedMath } from './sandboxed-math.js';

function outcome(expression: string): EngineError | 'evaluated' {
  try {
    evaluateFormulaSet({ inputs: { a: '2 mm', b: 3 }, expressions: [`x = ${expression}`] });
    return 'evaluated';
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
}

describe('formula sandbox against hostile expressions', () => {
  it.each(refused)('refuses %s', (expression) => {
    const result = outcome(expression);
    expect(result).toBeInstanceOf(EngineError);
    const error = result as EngineError;
    expect([error.code, error.fields['expressions.0']]).toEqual(['FORMULA_REFUSED', expect.stringMatching(/^Refused: /)]);
  });

  it.each(harmlessErrors)('ends %s in an ordinary error without running it', (expression) => {
    const result = outcome(expression);
    expect(result).toBeInstanceOf(EngineError);
    expect((result as EngineError).code).toBe('INVALID_INPUT');
    expect((result as EngineError).fields['expressions.0']).toBeTruthy();
  });

  it('refuses hostile checks, hostile names and over-long expressions too', () => {
    const error = (() => {
      try {
        evaluateFormulaSet({
          inputs: { constructor: 1, __proto__x: 2 },
          expressions: ['ok = 1', `long = ${'1'.repeat(600)}`, 'toString = 2', 'hasOwnProperty = 3'],
          checks: ['evaluate("1 > 0")', { expression: 'a.constructor', message: 'x' }],
        });
      } catch (caught) {
        return caught as EngineError;
      }
      throw new Error('expected an EngineError');
    })();
    expect(error.code).toBe('FORMULA_REFUSED');
    expect(error.fields).toMatchObject({
      'values.constructor': expect.stringMatching(/reserved/),
      'values.__proto__x': expect.stringMatching(/not a name/),
      'expressions.1': expect.stringMatching(/at most 500 characters/),
      'expressions.2': expect.stringMatching(/reserved/),
      'expressions.3': expect.stringMatching(/reserved/),
      'checks.0': expect.stringMatching(/^Refused: evaluate\(\)/),
      'checks.1': expect.stringMatching(/^Refused: property/),
    });
  });

  it('keeps the instance locked: every function that parses, compiles or extends throws', () => {
    const { math } = sandboxedMath();
    const reachable = math as unknown as Record<string, (...args: unknown[]) => unknown>;
    for (const name of ['import', 'createUnit', 'evaluate', 'parse', 'compile', 'simplify', 'derivative', 'resolve', 'rationalize', 'reviver', 'chain', 'help', 'config']) {
      expect(() => reachable[name]!('1')).toThrow(`Function ${name} is disabled`);
    }
  });

  it('leaves no trace on JavaScript prototypes and still evaluates afterwards', () => {
    const before = Object.getOwnPropertyNames(Object.prototype).sort();
    for (const expression of [...refused, ...harmlessErrors]) outcome(expression);
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(before);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(evaluateFormulaSet({ inputs: { a: '2 mm' }, expressions: ['x = a * 3'] }).results.x!.text).toBe('6 mm');
  });

  it('runs the whole hostile list quickly (no loops, recursion or large allocation reachable)', () => {
    const start = performance.now();
    for (const expression of [...refused, ...harmlessErrors]) outcome(expression);
    // Generous bound: evaluation is a single pass over ≤ 400 nodes per expression.
    expect(performance.now() - start).toBeLessThan(2_000);
  });
});
