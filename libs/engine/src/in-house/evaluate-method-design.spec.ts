import { designDefinitionSchema, safetyCaution, type DesignDefinitionInput } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { harmlessErrorFormulaExpressions, refusedFormulaExpressions } from '../formula/hostile-expressions.js';
import { checkMethodDesign } from './check-method-design.js';
import { describeMethodDesign } from './describe-method-design.js';
import { evaluateMethodDesign } from './evaluate-method-design.js';
import { failingRowMessages, runDesignTests } from './run-design-tests.js';

const define = (input: DesignDefinitionInput) => designDefinitionSchema.parse(input);

// Squeeze = (cross-section − gland depth) / cross-section (Parker O-Ring Handbook ORD 5700, gland design; from memory).
const squeeze = define({
  name: 'Squeeze',
  inputs: [
    { name: 'cord', label: 'Cord', kind: 'length', unit: 'mm', default: 3.53, min: 0.5, max: 15 },
    { name: 'depth', label: 'Gland depth', kind: 'length', unit: 'mm', default: 2.8, min: 0.1, max: 15 },
  ],
  outputs: [{ name: 'squeeze', label: 'Squeeze', expression: '100 * (cord - depth) / cord', unit: '', decimals: 2 }],
  checks: [{ expression: 'squeeze >= 15', message: 'At least 15 %' }],
  tests: [
    // (3.53 − 2.80)/3.53 = 20.68 % (hand calculation of the ORD 5700 definition).
    { label: 'nominal', inputs: { cord: 3.53, depth: 2.8 }, expected: { squeeze: { value: 20.68 } }, expectedVerdict: 'pass' },
  ],
});

// Same-material solid shaft: p = E·δ/(2R)·(1 − R²/ro²), δ radial (Shigley's Mechanical Engineering Design 10th ed. §3-16, Eq. 3-57; from memory):
// 207 GPa × 0.01 mm/(2 × 20 mm) × (1 − 0.25) = 38.8125 MPa.
const pressure = define({
  name: 'Press fit',
  inputs: [
    { name: 'E', label: 'Modulus', kind: 'stress', unit: 'GPa', default: 207 },
    { name: 'delta', label: 'Radial interference', kind: 'length', unit: 'um', default: 10 },
    { name: 'R', label: 'Radius', kind: 'length', unit: 'mm', default: 20 },
    { name: 'ro', label: 'Hub radius', kind: 'length', unit: 'mm', default: 40 },
  ],
  intermediates: [{ name: 'ratio', label: 'Radius ratio', expression: 'R / ro', unit: '', decimals: 3 }],
  outputs: [{ name: 'p', label: 'Contact pressure', expression: 'E * delta / (2 * R) * (1 - ratio^2)', unit: 'MPa', decimals: 3 }],
  safetyCritical: true,
});

function failure(run: () => unknown): EngineError {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
  throw new Error('expected an EngineError');
}

describe('evaluateMethodDesign', () => {
  it('evaluates with units, converts into the declared unit and keeps the derivation', () => {
    const result = evaluateMethodDesign(pressure, {});
    expect(result.outputs.p).toEqual({ value: 38.8125, unit: 'MPa', text: '38.813 MPa', label: 'Contact pressure' });
    expect(result.steps.map((step) => step.label)).toEqual(['Radius ratio', 'Contact pressure']);
    expect(result.steps[1]!.latex).toContain('\\left(207\\,\\mathrm{GPa}\\right)');
    expect(result.steps[1]!.latex.endsWith('= 38.8125\\,\\mathrm{MPa}')).toBe(true);
    expect(result.warnings).toEqual([]);
  });

  it('takes values in the input unit or as quantities with their own unit (1 in = 25.4 mm, NIST SP 811)', () => {
    const result = evaluateMethodDesign(squeeze, { cord: '0.139 in', depth: 2.8 });
    // 0.139 in = 3.5306 mm; (3.5306 − 2.8)/3.5306 = 20.69 %.
    expect(result.outputs.squeeze!.value).toBeCloseTo(20.6934, 4);
    expect(result.inputs.cord).toBeCloseTo(3.5306, 10);
    expect(result.verdict).toMatchObject({ pass: true, checks: [{ label: 'At least 15 %', pass: true }] });
  });

  it('refuses values out of range, unknown names and missing values per field', () => {
    const noDefault = define({ ...squeeze, inputs: [{ ...squeeze.inputs[0]!, default: null }, squeeze.inputs[1]!] });
    const error = failure(() => evaluateMethodDesign(noDefault, { depth: 20, colour: 3 }));
    expect(error.fields).toEqual({
      'values.colour': 'colour is not an input of this method',
      'values.cord': 'Give a value for Cord',
      'values.depth': 'Gland depth must be at most 15 mm',
    });
    expect(failure(() => evaluateMethodDesign(squeeze, { cord: '2 kg' })).fields['values.cord']).toMatch(/cannot be converted to mm/);
  });

  it("reports a result whose dimension does not fit the output's unit at the expression", () => {
    const wrong = define({ ...pressure, outputs: [{ ...pressure.outputs[0]!, unit: 'mm' }] });
    expect(failure(() => evaluateMethodDesign(wrong, {})).fields).toEqual({ 'outputs.0.expression': "Result is in MPa but the output's unit is mm" });
    const plain = define({ ...squeeze, outputs: [{ ...squeeze.outputs[0]!, unit: 'mm' }] });
    expect(failure(() => evaluateMethodDesign(plain, {})).fields['outputs.0.expression']).toBe("Result is a plain number but the output's unit is mm");
  });

  it('checks the unit of each input against its kind, and names, at the input', () => {
    const bad = define({
      ...squeeze,
      inputs: [
        { name: 'cord', label: 'Cord', kind: 'pressure', unit: 'mm' },
        { name: 'depth', label: 'Depth', kind: 'length', unit: 'furlongs per fortnight' },
        { name: 'sqrt', label: 'x', kind: 'dimensionless' },
      ],
    });
    const fields = failure(() => evaluateMethodDesign(bad, {}, { sampleMissing: true })).fields;
    expect(fields['inputs.0.unit']).toMatch(/mm is not a unit of pressure/);
    expect(fields['inputs.1.unit']).toMatch(/not a unit mathjs knows/);
    expect(fields['inputs.2.name']).toMatch(/function/);
  });
});

describe('checkMethodDesign', () => {
  it('returns no problems and the TeX of each expression for a sound design', () => {
    const check = checkMethodDesign(pressure);
    expect(check.problems).toEqual({});
    expect(check.tex['intermediates.0.expression']).toBe('\\frac{ R}{ ro}');
    expect(Object.keys(check.tex)).toEqual(['intermediates.0.expression', 'outputs.0.expression']);
  });

  it('refuses every hostile expression as an intermediate, an output or a check, without running it', () => {
    for (const expression of [...refusedFormulaExpressions, ...harmlessErrorFormulaExpressions]) {
      for (const [section, field] of [
        ['intermediates', 'intermediates.0.expression'],
        ['outputs', 'outputs.0.expression'],
        ['checks', 'checks.0.expression'],
      ] as const) {
        const design = structuredClone(squeeze);
        if (section === 'checks') design.checks[0]!.expression = expression;
        else if (section === 'outputs') design.outputs[0]!.expression = expression;
        else design.intermediates = [{ name: 'x', label: 'x', expression, unit: '', decimals: 3 }];
        const check = checkMethodDesign(design);
        expect(check.problems[field], `${section}: ${expression}`).toEqual(expect.any(String));
        if (refusedFormulaExpressions.includes(expression)) {
          expect(check.refused, expression).toBe(true);
          expect(check.tex[field], expression).toBeUndefined();
        }
      }
    }
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('runDesignTests', () => {
  it('passes rows within tolerance or at the shown decimals and names the failing ones', () => {
    expect(runDesignTests(squeeze)).toMatchObject({ pass: true, passed: 1, failed: 0 });
    const failing = define({
      ...squeeze,
      tests: [
        ...squeeze.tests,
        { label: 'wrong', inputs: { depth: 2.9 }, expected: { squeeze: { value: 20, tolerance: 0.1 } } },
        { label: 'verdict', inputs: { depth: 3.2 }, expected: {}, expectedVerdict: 'pass' },
        { label: 'out of range', inputs: { depth: 99 }, expected: { squeeze: { value: 1 } } },
      ],
    });
    const run = runDesignTests(failing);
    expect(run).toMatchObject({ pass: false, passed: 1, failed: 3 });
    // (3.53 − 2.9)/3.53 = 17.847 % (same definition).
    expect(run.rows[1]!.outputs[0]).toMatchObject({ expected: 20, actual: 17.8470254958, pass: false });
    expect(failingRowMessages(run)).toEqual({
      'tests.1': 'Row 2 (wrong) fails: squeeze expected 20 ± 0.1, got 17.8470254958',
      'tests.2': 'Row 3 (verdict) fails: verdict expected pass, got fail',
      'tests.3': 'Row 4 (out of range) cannot be evaluated: Gland depth must be at most 15 mm',
    });
  });

  it('refuses to run a table naming inputs or outputs the design does not have', () => {
    const bad = define({ ...squeeze, tests: [{ inputs: { cords: 3 }, expected: { squeez: { value: 1 } } }] });
    expect(failure(() => runDesignTests(bad)).fields).toMatchObject({
      'tests.0.inputs.cords': 'cords is not an input of this method',
      'tests.0.expected.squeez': 'squeez is not an output of this method',
    });
  });
});

describe('describeMethodDesign', () => {
  it('gives the form a JSON schema with ranges, defaults, units and the safety caution', () => {
    const summary = describeMethodDesign('house:press', 2, pressure);
    expect(summary).toMatchObject({ id: 'house:press', version: 2, source: 'in-house', title: 'Press fit', cautions: [safetyCaution] });
    expect(summary.inputSchema).toMatchObject({
      type: 'object',
      required: [],
      properties: { E: { type: 'number', default: 207, 'x-unit': 'GPa', title: 'Modulus' } },
    });
    const squeezeSchema = describeMethodDesign('house:sq', 1, squeeze).inputSchema as { properties: Record<string, unknown> };
    expect(squeezeSchema.properties.cord).toMatchObject({ minimum: 0.5, maximum: 15, description: 'Cord [mm]' });
  });
});

describe('units that are really numbers', () => {
  it('refuses "1/mm" as a unit (it is the number 1 over mm) at the field, and accepts mm^-1', () => {
    const reciprocal = define({ ...squeeze, outputs: [{ name: 'k', label: 'k', expression: '1 / cord', unit: '1/mm' }], checks: [], tests: [] });
    expect(failure(() => evaluateMethodDesign(reciprocal, {})).fields['outputs.0.unit']).toMatch(/not a unit mathjs knows/);
    const fixed = define({ ...reciprocal, outputs: [{ name: 'k', label: 'k', expression: '1 / cord', unit: 'mm^-1', decimals: 4 }] });
    // 1/3.53 mm = 0.2833 mm⁻¹ (arithmetic).
    expect(evaluateMethodDesign(fixed, {}).outputs.k).toMatchObject({ unit: 'mm^-1', text: '0.2833 mm^-1' });
  });
});
