import { describe, expect, it } from 'vitest';
import { parseFormulaValue } from './parse-formula-value.js';
import { sandboxedMath } from './sandboxed-math.js';

const sandbox = sandboxedMath();

describe('parseFormulaValue', () => {
  it('reads numbers, numeric text and quantities with units', () => {
    expect(parseFormulaValue(12.5, sandbox)).toEqual({ value: 12.5 });
    expect(parseFormulaValue(' -1.5e3 ', sandbox)).toEqual({ value: -1500 });
    const quantity = parseFormulaValue('210 GPa', sandbox);
    expect('value' in quantity && String(quantity.value)).toBe('210 GPa');
  });

  it('refuses expressions, bare units and non-finite values', () => {
    expect(parseFormulaValue('2 mm + 3 mm', sandbox)).toEqual({ problem: '"2 mm + 3 mm" is not a number or a quantity with a unit such as 12 mm' });
    expect(parseFormulaValue('evaluate("1")', sandbox)).toMatchObject({ problem: expect.stringMatching(/is not a number/) });
    expect(parseFormulaValue('mm', sandbox)).toMatchObject({ problem: expect.stringMatching(/unit without a value/) });
    expect(parseFormulaValue('1e999', sandbox)).toEqual({ problem: 'Value must be a finite number' });
  });
});
