import { describe, expect, it } from 'vitest';
import { disabledFunctionNames, sandboxedMath } from './sandboxed-math.js';

describe('sandboxedMath', () => {
  it('disables every function that parses, compiles or extends the instance (mathjs security guide)', () => {
    const reachable = sandboxedMath().math as unknown as Record<string, (...args: unknown[]) => unknown>;
    for (const name of disabledFunctionNames) expect(() => reachable[name]!('1 + 1'), name).toThrow(`Function ${name} is disabled`);
  });

  it('keeps a private parser and ordinary unit arithmetic working', () => {
    const { parse } = sandboxedMath();
    expect(String(parse('2 mm + 3 mm').compile().evaluate(new Map()))).toBe('5 mm');
    expect(sandboxedMath()).toBe(sandboxedMath());
  });
});
