import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { evaluateFormulaSet } from './evaluate-formula-set.js';
import { sandboxedMath } from './sandboxed-math.js';

// Escapes and resource attacks collected from the mathjs security guide, published mathjs
// sandbox-escape reports and common practice; each must be refused (FORMULA_REFUSED), or end in
// an ordinary error (INVALID_INPUT) without running anything.
const refused = [
  'cos.constructor("return process")',
  '[].map.constructor',
  '"".constructor',
  'sqrt.constructor',
  'pi.constructor.prototype',
  'a.__proto__',
  'a["__proto__"]',
  'a["constructor"]["constructor"]("return process")',
  'import({ evil: 1 }, { override: true })',
  'createUnit("furlong")',
  'evaluate("1 + 1")',
  'parse("1 + 1").compile()',
  'compile("1 + 1")',
  'simplify("x + x")',
  'derivative("x^2", "x")',
  'rationalize("1 / x")',
  'resolve(a)',
  'reviver("a", 1)',
  'chain(3)',
  'help(sqrt)',
  'config({ number: "BigNumber" })',
  'typed("f", { number: 1 })',
  'y = 1',
  'f(x) = f(x)',
  'zeros(1e5, 1e5)',
  'ones(10000, 10000)',
  'range(1, 1e9)',
  '1:1e9',
  'identity(100000)',
  'matrix([1, 2])',
  '[1, 2, 3]',
  'map([1, 2], sqrt)',
  'unit("5 mm")',
  'format(1)',
  'bignumber("1e99999")',
  'a; b',
  '100000!',
  'sqrt(a)\'',
  'b ? evaluate("1") : 2',
  'Function("return 1")',
  'sqrt',
  '(' .repeat(45) + '1' + ')'.repeat(45),
  Array.from({ length: 240 }, () => '1').join('+'),
  '1 + '.repeat(200) + '1',
];

const harmlessErrors = [
  'cos.constructor("return process")()',
  '__proto__',
  'constructor',
  'process',
  'globalThis',
  'this',
  '10^1e308',
  'sqrt(-1)',
  'x + 1',
];

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
