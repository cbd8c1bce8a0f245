import { describe, expect, it } from 'vitest';
import { formulaNameProblem } from './formula-name-problem.js';

describe('formulaNameProblem', () => {
  it('accepts ordinary names, including mathjs function names that are not callable in formulas', () => {
    for (const name of ['d_hub', 'squeeze', 'range', 'E', 'x1']) expect(formulaNameProblem(name), name).toBeUndefined();
  });

  it('refuses callable functions, constants, parser words, object properties and malformed names', () => {
    expect(formulaNameProblem('sqrt')).toMatch(/function/);
    expect(formulaNameProblem('evaluate')).toMatch(/function/);
    expect(formulaNameProblem('pi')).toMatch(/constant/);
    expect(formulaNameProblem('to')).toMatch(/word of the formula language/);
    expect(formulaNameProblem('constructor')).toMatch(/reserved/);
    expect(formulaNameProblem('__proto__')).toMatch(/not a name/);
    expect(formulaNameProblem('2x')).toMatch(/not a name/);
    expect(formulaNameProblem('a'.repeat(65))).toMatch(/at most 64/);
  });
});
