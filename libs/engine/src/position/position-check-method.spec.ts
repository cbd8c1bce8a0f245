import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { MM_PER_INCH } from '../core/units.js';
import { evaluateMethod } from '../registry.js';
import { positionCheckMethod, type PositionCheckOutputs } from './position-check-method.js';

const run = (inputs: unknown, unit: 'mm' | 'in' = 'mm') => {
  const result = evaluateMethod(positionCheckMethod, inputs, unit);
  return { ...result, outputs: result.outputs as unknown as PositionCheckOutputs };
};

const fieldsOf = (inputs: unknown): Record<string, string> => {
  try {
    run(inputs);
  } catch (error) {
    if (error instanceof EngineError) return error.fields;
    throw error;
  }
  throw new Error('expected an EngineError');
};

const square = [
  { label: 'H1', basicX: 50, basicY: 0 },
  { label: 'H2', basicX: 0, basicY: 50 },
  { label: 'H3', basicX: -50, basicY: 0 },
  { label: 'H4', basicX: 0, basicY: -50 },
];
const measured = (offsets: [number, number][], actualSize = 10) =>
  square.map((hole, index) => ({ ...hole, measuredX: hole.basicX + offsets[index]![0], measuredY: hole.basicY + offsets[index]![1], actualSize }));

// Holes Ø10.0–10.2 ⌖ Ø0.1 Ⓜ to a pilot bore Ø30.0–30.1 at MMB (the reference.md §4 hole, located to a bore [D]).
const base = {
  featureType: 'internal',
  lowerLimit: 10,
  upperLimit: 10.2,
  positionTolerance: 0.1,
  toleranceModifier: 'MMC',
  datum: { featureType: 'internal', lowerLimit: 30, upperLimit: 30.1, actualSize: 30.1 },
  datumModifier: 'MMB',
};

describe('position-check method', () => {
  it('reports each feature: offsets, diameter, bonus, allowed and conformance', () => {
    const { outputs, verdict, steps } = run({ ...base, datum: null, datumModifier: null, features: measured([[0.03, 0.04], [0, 0], [-0.06, 0.08], [0, 0]], 10.05) });
    // [D] 2·√(0.03² + 0.04²) = 0.1; 2·√(0.06² + 0.08²) = 0.2; bonus 10.05 − 10.0 = 0.05 (ASME Y14.5-2018 §10; reference.md §4).
    expect(outputs.features[0]).toEqual({
      label: 'H1',
      dx: 0.03,
      dy: 0.04,
      deviation: 0.1,
      actualSize: 10.05,
      sizeConforms: true,
      bonus: 0.05,
      allowed: 0.15,
      conformsAsMeasured: true,
      deviationWithShift: null,
    });
    expect(outputs.features[2]).toMatchObject({ deviation: 0.2, allowed: 0.15, conformsAsMeasured: false });
    expect(outputs).toMatchObject({ sizeTolerance: 0.2, maxBonus: 0.2, datumShift: 0, featuresConformingAsMeasured: 3, conformsAsMeasured: false, patternConforms: false, shiftX: null });
    expect(verdict?.pass).toBe(false);
    expect(verdict?.checks.find((check) => check.label.startsWith('Position'))?.detail).toMatch(/outside: H3/);
    expect(steps.map((step) => step.label)).toContain('Position deviation of H3, as a diameter');
  });

  it('moves the pattern as a group within the datum feature shift (reference.md §4)', () => {
    // Every hole 0.06 off in x: 0.12 > 0.1 each as measured; datum bore at 30.1 against MMB 30.0 gives S = 0.1 [D],
    // so a translation of 0.01…0.05 in x brings all four into their Ø0.1 zones.
    const { outputs, verdict, warnings, steps } = run({ ...base, features: measured([[0.06, 0], [0.06, 0], [0.06, 0], [0.06, 0]]) });
    expect(outputs.datumShift).toBe(0.1);
    expect(outputs.conformsAsMeasured).toBe(false);
    expect(outputs.patternConforms).toBe(true);
    expect(outputs.shiftX).toBeGreaterThanOrEqual(0.01);
    expect(outputs.shiftX).toBeLessThanOrEqual(0.05);
    expect(outputs.shiftUsed).toBeLessThanOrEqual(0.1);
    for (const row of outputs.features) expect(row.deviationWithShift).toBeLessThanOrEqual(0.1);
    expect(verdict?.pass).toBe(true);
    expect(warnings.join(' ')).toMatch(/rotation of the pattern is not considered/);
    expect(steps.at(-1)?.label).toMatch(/translation only/);
  });

  it('never adds the shift to each feature: holes off in opposite directions fail (reference.md §4 [C])', () => {
    // Adding S to each zone (0.1 + 0.1) would accept 0.18 each; one translation cannot serve +0.09 and −0.09 with radius 0.05.
    const { outputs, verdict, warnings } = run({ ...base, features: measured([[0.09, 0], [0, 0], [-0.09, 0], [0, 0]]) });
    expect(outputs.features[0]!.deviation).toBe(0.18);
    expect(outputs.patternConforms).toBe(false);
    expect(outputs.features[0]!.deviationWithShift).toBeNull();
    expect(verdict?.pass).toBe(false);
    expect(warnings.join(' ')).toMatch(/No translation within the datum feature shift/);
  });

  it('gives no shift at RMB and no shift without a datum feature of size', () => {
    const features = measured([[0.06, 0], [0.06, 0], [0.06, 0], [0.06, 0]]);
    expect(run({ ...base, datumModifier: 'RMB', features }).outputs).toMatchObject({ datumShift: 0, patternConforms: false });
    expect(run({ ...base, datum: { featureType: 'internal' }, datumModifier: null, features }).outputs).toMatchObject({ datumShift: 0, patternConforms: false });
  });

  it('fails a feature outside its size limits with no bonus, and the pattern with it', () => {
    const features = measured([[0, 0], [0, 0], [0, 0], [0, 0]]);
    features[1] = { ...features[1]!, actualSize: 10.21 };
    const { outputs, warnings, verdict } = run({ ...base, features });
    expect(outputs.features[1]).toMatchObject({ sizeConforms: false, bonus: 0, conformsAsMeasured: false });
    expect(verdict?.summary).toBe('Pattern does not conform: 1 of 4 features outside their size limits.');
    expect(outputs.patternConforms).toBe(false);
    expect(warnings.join(' ')).toMatch(/Outside the size limits .*H2/);
  });

  it('keeps a label as plain text, formula-like or not', () => {
    const label = "=cmd|' /C calc'!A0";
    const features = measured([[0, 0], [0, 0], [0, 0], [0.2, 0]]);
    features[3] = { ...features[3]!, label };
    const { outputs, steps } = run({ ...base, datum: null, datumModifier: null, features });
    expect(outputs.features[3]!.label).toBe(label);
    expect(steps.some((step) => step.label.includes(label))).toBe(true);
  });

  it('answers bad input with one message per field', () => {
    expect(fieldsOf({ ...base, lowerLimit: 10.3, features: measured([[0, 0], [0, 0], [0, 0], [0, 0]]) })).toMatchObject({ 'inputs.lowerLimit': 'Lower limit must not exceed the upper limit' });
    expect(fieldsOf({ ...base, features: [] })).toMatchObject({ 'inputs.features': 'Add at least one measured feature' });
    expect(fieldsOf({ ...base, datum: { featureType: 'internal', actualSize: 30 }, features: measured([[0, 0], [0, 0], [0, 0], [0, 0]]) })).toHaveProperty('inputs.datum.lowerLimit');
    expect(fieldsOf({ ...base, datum: null, datumModifier: 'MMB', features: measured([[0, 0], [0, 0], [0, 0], [0, 0]]) })).toHaveProperty('inputs.datumModifier');
    const long = measured([[0, 0], [0, 0], [0, 0], [0, 0]]);
    long[0] = { ...long[0]!, label: 'x'.repeat(41) };
    expect(fieldsOf({ ...base, features: long })).toMatchObject({ 'inputs.features.0.label': 'Label is at most 40 characters' });
    const tooMany = Array.from({ length: 501 }, (_v, index) => ({ label: `H${index}`, basicX: index, basicY: 0, measuredX: index, measuredY: 0, actualSize: 10 }));
    expect(fieldsOf({ ...base, features: tooMany })).toMatchObject({ 'inputs.features': 'At most 500 features per check' });
  });

  it('accepts any pattern moved as a group within the datum shift, where each feature alone (no shift) fails', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -200, max: 200, noNaN: true }), fc.double({ min: -200, max: 200, noNaN: true })), { minLength: 1, maxLength: 12 }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.double({ min: 0.051, max: 0.099, noNaN: true }),
        (points, angle, radius) => {
          // The whole pattern displaced by one translation of radius 0.051…0.099: each deviation 2·radius > Ø0.1, yet the
          // datum shift S = 0.1 lets the pattern move back by up to 0.05, leaving each axis within 0.05 of true position [D].
          const s = { x: radius * Math.cos(angle), y: radius * Math.sin(angle) };
          const features = points.map(([x, y], index) => ({ label: `H${index + 1}`, basicX: x, basicY: y, measuredX: x + s.x, measuredY: y + s.y, actualSize: 10 }));
          const withShift = run({ ...base, features }).outputs;
          expect(withShift.conformsAsMeasured).toBe(false);
          expect(withShift.patternConforms).toBe(true);
          for (const row of withShift.features) expect(row.deviationWithShift).toBeLessThanOrEqual(0.1);
          const alone = run({ ...base, datum: null, datumModifier: null, features: features.slice(0, 1) }).outputs;
          expect(alone.patternConforms).toBe(false);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('agrees in mm and inch', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            x: fc.double({ min: -150, max: 150, noNaN: true }),
            y: fc.double({ min: -150, max: 150, noNaN: true }),
            dx: fc.double({ min: -0.2, max: 0.2, noNaN: true }),
            dy: fc.double({ min: -0.2, max: 0.2, noNaN: true }),
            size: fc.double({ min: 10, max: 10.2, noNaN: true }),
          }),
          { minLength: 1, maxLength: 8 },
        ),
        fc.constantFrom('MMB' as const, 'LMB' as const, 'RMB' as const),
        (points, datumModifier) => {
          const features = points.map((p, index) => ({ label: `H${index + 1}`, basicX: p.x, basicY: p.y, measuredX: p.x + p.dx, measuredY: p.y + p.dy, actualSize: p.size }));
          const inMm = run({ ...base, datumModifier, features }).outputs;
          const inch = (v: number) => v / MM_PER_INCH;
          const inIn = run(
            {
              ...base,
              datumModifier,
              lowerLimit: inch(10),
              upperLimit: inch(10.2),
              positionTolerance: inch(0.1),
              datum: { featureType: 'internal', lowerLimit: inch(30), upperLimit: inch(30.1), actualSize: inch(30.1) },
              features: features.map((f) => ({ ...f, basicX: inch(f.basicX), basicY: inch(f.basicY), measuredX: inch(f.measuredX), measuredY: inch(f.measuredY), actualSize: inch(f.actualSize) })),
            },
            'in',
          ).outputs;
          expect(inIn.datumShift * MM_PER_INCH).toBeCloseTo(inMm.datumShift, 3);
          inMm.features.forEach((row, index) => {
            const other = inIn.features[index]!;
            expect(other.deviation * MM_PER_INCH).toBeCloseTo(row.deviation, 3);
            expect(other.allowed * MM_PER_INCH).toBeCloseTo(row.allowed, 3);
            // Verdicts agree wherever the margin is above the shown resolution (0.1 µm, 0.01 thou).
            if (Math.abs(row.deviation - row.allowed) > 0.001) expect(other.conformsAsMeasured).toBe(row.conformsAsMeasured);
          });
        },
      ),
      { numRuns: 150 },
    );
  });
});
