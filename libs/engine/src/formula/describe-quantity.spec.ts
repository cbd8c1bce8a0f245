import { describe, expect, it } from 'vitest';
import { describeQuantity, formulaValueProblem, quantityLatex } from './describe-quantity.js';
import { sandboxedMath } from './sandboxed-math.js';

const sandbox = sandboxedMath();
const evaluate = (text: string) => sandbox.parse(text).compile().evaluate(new Map());

describe('describeQuantity', () => {
  it('keeps units as written, simplifies derived ones, and removes float noise', () => {
    expect(describeQuantity(evaluate('1500 mm'), sandbox)).toEqual({ value: 1500, unit: 'mm', text: '1500 mm' });
    expect(describeQuantity(evaluate('1000 N / (10 mm * 100 mm)'), sandbox)).toEqual({ value: 1, unit: 'MPa', text: '1 MPa' });
    // sin(30°) is 0.49999999999999994 in binary floating point.
    expect(describeQuantity(evaluate('sin(30 deg)'), sandbox)).toEqual({ value: 0.5, unit: null, text: '0.5' });
    expect(describeQuantity(true, sandbox)).toEqual({ value: true, unit: null, text: 'true' });
  });

  it('typesets the value with the unit as LaTeX', () => {
    expect(quantityLatex({ value: 2, unit: 'N / mm^2', text: '2 N / mm^2' }, sandbox.parse)).toBe('2\\,\\frac{\\mathrm{N}}{{\\mathrm{mm}}^{2}}');
    expect(quantityLatex({ value: 3e-9, unit: 'mm', text: '3e-9 mm' }, sandbox.parse)).toBe('3\\times 10^{-9}\\,\\mathrm{mm}');
  });

  it('names results that cannot be reported', () => {
    expect(formulaValueProblem(Infinity)).toMatch(/not a finite number/);
    expect(formulaValueProblem(evaluate('sqrt(-1)'))).toMatch(/complex/);
    expect(formulaValueProblem(evaluate('mm'))).toMatch(/unit without a value/);
    expect(formulaValueProblem('text')).toMatch(/not a number/);
    expect(formulaValueProblem(evaluate('2 mm'))).toBeUndefined();
  });
});
