import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { evaluateFormulaSet, type FormulaSetDefinition } from './evaluate-formula-set.js';

function refusal(definition: FormulaSetDefinition): EngineError {
  try {
    evaluateFormulaSet(definition);
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
  throw new Error('expected an EngineError');
}

describe('evaluateFormulaSet', () => {
  it('computes O-ring squeeze as a share of the cross-section, with units cancelling', () => {
    // Squeeze = (cord − groove depth)/cord (Parker O-Ring Handbook ORD 5700, gland design): (3.53 − 2.80)/3.53 = 20.68 %.
    const result = evaluateFormulaSet({
      inputs: { cord: '3.53 mm', depth: '2.8 mm' },
      expressions: ['squeeze = (cord - depth) / cord', 'squeezePercent = 100 * squeeze'],
      checks: [{ expression: 'squeeze >= 0.15 and squeeze <= 0.30', message: 'Static squeeze between 15 and 30 %' }, 'depth < cord'],
    });
    expect(result.results.squeeze).toEqual({ value: 0.206798866856, unit: null, text: '0.206799' });
    expect(result.results.squeezePercent!.text).toBe('20.6799');
    expect(result.checks).toEqual([
      { expression: 'squeeze >= 0.15 and squeeze <= 0.30', message: 'Static squeeze between 15 and 30 %', pass: true, detail: '0.206799 >= 0.15 and 0.206799 <= 0.3' },
      { expression: 'depth < cord', pass: true, detail: '(2.8 mm) < (3.53 mm)' },
    ]);
    expect(result.inputs.cord).toEqual({ value: 3.53, unit: 'mm', text: '3.53 mm' });
  });

  it('computes an interference-fit pressure with mixed units', () => {
    // Same material, solid shaft: p = E·δ/(2R)·(1 − R²/ro²) with δ the radial interference
    // (Shigley's Mechanical Engineering Design, press and shrink fits; from memory).
    // 207 GPa × 0.01 mm/(2 × 20 mm) × (1 − 0.25) = 38.8125 MPa.
    const result = evaluateFormulaSet({
      inputs: { E: '207 GPa', delta: '0.01 mm', R: '20 mm', ro: '0.04 m' },
      expressions: ['p = E * delta / (2 * R) * (1 - (R / ro)^2) to MPa'],
      checks: ['p < 50 MPa', 'p > 40 MPa'],
    });
    expect(result.results.p).toEqual({ value: 38.8125, unit: 'MPa', text: '38.8125 MPa' });
    expect(result.checks.map((check) => check.pass)).toEqual([true, false]);
    expect(result.steps[0]!.latex).toContain('\\left(207\\,\\mathrm{GPa}\\right)');
    expect(result.steps[0]!.latex.endsWith('= 38.8125\\,\\mathrm{MPa}')).toBe(true);
  });

  it('converts inches exactly (1 in = 25.4 mm, NIST SP 811) and simplifies derived units', () => {
    const result = evaluateFormulaSet({
      inputs: { force: '1000 N', width: 10, bore: '20 mm', length: 1500 },
      expressions: ['total = (12 mm + 1 in) to mm', 'stress = force / (bore * 50 mm)', 'ratio = length / width'],
    });
    expect(result.results.total).toEqual({ value: 37.4, unit: 'mm', text: '37.4 mm' });
    expect(result.results.stress).toEqual({ value: 1, unit: 'MPa', text: '1 MPa' });
    expect(result.results.ratio).toEqual({ value: 150, unit: null, text: '150' });
  });

  it('reports a unit mismatch at the expression, naming the operation and the quantities', () => {
    const error = refusal({ inputs: { gap: '12 mm', mass: '2 kg' }, expressions: ['ok = gap * 2', 'bad = ok + mass'] });
    expect(error.code).toBe('INVALID_INPUT');
    expect(error.fields).toEqual({ 'expressions.1': 'In ok + mass: units do not match (a quantity in mm (length) and a quantity in kg (mass))' });
    expect(refusal({ inputs: { gap: '12 mm' }, expressions: ['bad = gap + 1'] }).fields['expressions.0']).toMatch(/^In gap \+ 1: cannot combine a quantity in mm \(length\) and the plain number 1/);
    expect(refusal({ inputs: { gap: '12 mm' }, expressions: ['c = gap > 2 kg'] }).fields['expressions.0']).toMatch(/cannot compare/);
  });

  it('reports undefined names, names used before they are defined, duplicates and bad values per field', () => {
    const error = refusal({
      inputs: { a: '1 mm', b: 'twelve', pi: 3, mm: 2 },
      expressions: ['x = a + later', 'later = a * 2', 'y = ghost', 'later = 3 mm', 'a = 4', 'no assignment here'],
      checks: ['x'],
    });
    expect(error.code).toBe('INVALID_INPUT');
    expect(error.fields).toMatchObject({
      'values.b': '"twelve" is not a number or a quantity with a unit such as 12 mm',
      'values.pi': expect.stringMatching(/constant/),
      'expressions.0': 'later is defined further down (expression 2); define it before it is used',
      'expressions.2': 'ghost is not defined: give it as a value or define it in an expression above',
      'expressions.3': 'later is already defined in expression 2',
      'expressions.4': 'a is already an input value; choose another name',
      'expressions.5': expect.stringMatching(/name = expression/),
    });
    // x failed, so the check that uses it is not reported twice.
    expect(error.fields['checks.0']).toBeUndefined();
  });

  it('lets a value shadow a unit or a mathjs function name, with a warning for units', () => {
    const result = evaluateFormulaSet({ inputs: { L: '10 mm', squeeze: 0.2 }, expressions: ['half = L / 2', 'twice = 2 * squeeze'] });
    expect(result.results.half!.text).toBe('5 mm');
    expect(result.results.twice!.value).toBe(0.4);
    expect(result.warnings).toEqual(['L is also a unit; in these formulas L means your value, not the unit']);
  });

  it('requires checks to be true/false and results to be finite and real', () => {
    expect(refusal({ inputs: {}, expressions: ['a = 1'], checks: ['a + 1'] }).fields['checks.0']).toMatch(/true or false/);
    expect(refusal({ inputs: {}, expressions: ['a = 1 / 0'] }).fields['expressions.0']).toMatch(/not a finite number/);
    expect(refusal({ inputs: {}, expressions: ['a = sqrt(-4)'] }).fields['expressions.0']).toMatch(/complex/);
    expect(refusal({ inputs: { u: 'mm' }, expressions: ['a = 1'] }).fields['values.u']).toMatch(/unit without a value/);
  });

  it('accepts expressions as { name, expression } for callers that keep them apart', () => {
    const result = evaluateFormulaSet({ inputs: { d: '10 mm' }, expressions: [{ name: 'area', expression: 'pi * d^2 / 4' }] });
    expect(result.results.area!.unit).toBe('mm^2');
    expect(result.results.area!.value).toBeCloseTo(78.5398163397, 9);
  });

  it('evaluates a long ordinary sum (a deep tree) within the limits', () => {
    // 1 + 2 + … + 150 = 150 × 151 / 2 = 11 325.
    const sum = Array.from({ length: 150 }, (_, index) => index + 1).join('+');
    expect(evaluateFormulaSet({ inputs: {}, expressions: [`total = ${sum}`] }).results.total!.value).toBe(11_325);
  });

  it('refuses more expressions than the limit with LIMIT_EXCEEDED', () => {
    const error = refusal({ inputs: {}, expressions: Array.from({ length: 101 }, (_, index) => `a${index} = ${index}`) });
    expect(error.code).toBe('LIMIT_EXCEEDED');
    expect(error.fields.expressions).toMatch(/At most 100/);
  });
});
