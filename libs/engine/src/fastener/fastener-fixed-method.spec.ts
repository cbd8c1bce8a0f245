import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { MM_PER_INCH } from '../core/units.js';
import { evaluateMethod } from '../registry.js';
import { fastenerFixedMethod, type FastenerFixedOutputs } from './fastener-fixed-method.js';

const fixed = (inputs: unknown, unit: 'mm' | 'in' = 'mm') => {
  const result = evaluateMethod(fastenerFixedMethod, inputs, unit);
  return { ...result, outputs: result.outputs as unknown as FastenerFixedOutputs };
};
const fieldsOf = (run: () => unknown): Record<string, string> => {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineError) return error.fields;
    throw error;
  }
  throw new Error('expected an EngineError');
};

describe('fastener-fixed method', () => {
  // T = (H − F)/2 (reference.md §6 [C]); M10 numbers [D].
  it('splits the clearance equally with a projected zone: 0.25 each', () => {
    const { outputs, steps } = fixed({ holeSize: 10.5, fastenerSize: 10 });
    expect(outputs).toEqual({ solvedFor: 'positionTolerance', holeSize: 10.5, fastenerSize: 10, positionTolerance: 0.25, toleranceThreaded: 0.25, projectedZone: true, projectionFactor: 1 });
    expect(steps.at(-1)?.latex).toBe('T_1 = T_2 = \\tfrac{H - F}{1 + k} = \\tfrac{10.5 - 10}{1 + 1} = 0.25');
  });

  // H = F + T1 + T2 (reference.md §6 [C]); T1 0.2 / T2 0.3 [D].
  it('takes an unequal split', () => {
    expect(fixed({ holeSize: 10.5, fastenerSize: 10, toleranceThreaded: 0.3 }).outputs.positionTolerance).toBe(0.2);
    expect(fixed({ fastenerSize: 10, positionTolerance: 0.2, toleranceThreaded: 0.3 }).outputs.holeSize).toBe(10.5);
  });

  // H = F + T1 + T2(1 + 2P/D): inputs [C], printed form from memory (reference.md §6 [M]).
  it('adds the projection term where the fixed part has no projected zone, with a warning', () => {
    const { outputs, warnings, steps } = fixed({ fastenerSize: 10, positionTolerance: 0.2, projection: 12, engagementDepth: 15 });
    expect(outputs).toMatchObject({ solvedFor: 'holeSize', holeSize: 10.72, toleranceThreaded: 0.2, projectedZone: false, projectionFactor: 2.6 });
    expect(steps[0]?.latex).toBe('k = 1 + \\tfrac{2P}{D} = 1 + \\tfrac{2 \\cdot 12}{15} = 2.6');
    expect(steps.at(-1)?.latex).toBe('H = 10 + 0.2 + 2.6 \\cdot 0.2 = 10.72');
    expect(warnings.join(' ')).toMatch(/counts 2\.6 times/);
  });

  it('requires projection and engagement depth together', () => {
    expect(fieldsOf(() => fixed({ holeSize: 10.5, fastenerSize: 10, projection: 12 }))).toEqual({
      'inputs.engagementDepth': 'Give both projection and engagement depth (no projected tolerance zone) or neither (projected tolerance zone)',
    });
    expect(Object.keys(fieldsOf(() => fixed({ holeSize: 10.5, fastenerSize: 10, projection: 12, engagementDepth: 0 })))).toEqual(['inputs.engagementDepth']);
  });

  it('refuses a negative solved tolerance with the field to change', () => {
    expect(Object.keys(fieldsOf(() => fixed({ holeSize: 10.5, fastenerSize: 10, toleranceThreaded: 0.6 })))).toEqual(['inputs.toleranceThreaded']);
    expect(Object.keys(fieldsOf(() => fixed({ holeSize: 9.9, fastenerSize: 10 })))).toEqual(['inputs.holeSize']);
  });

  it('asks for exactly one unknown', () => {
    expect(Object.keys(fieldsOf(() => fixed({ toleranceThreaded: 0.2 })))).toEqual(['inputs.holeSize', 'inputs.fastenerSize', 'inputs.positionTolerance']);
  });

  it('gives the same results in mm and inch', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2000, max: 40_000 }),
        fc.integer({ min: 0, max: 2000 }),
        fc.integer({ min: 0, max: 2000 }),
        fc.option(fc.tuple(fc.integer({ min: 0, max: 30_000 }), fc.integer({ min: 1000, max: 30_000 })), { nil: undefined }),
        (fastenerMicrons, t1Microns, t2Microns, projection) => {
          const mm = {
            fastenerSize: fastenerMicrons / 1000,
            positionTolerance: t1Microns / 1000,
            toleranceThreaded: t2Microns / 1000,
            ...(projection ? { projection: projection[0] / 1000, engagementDepth: projection[1] / 1000 } : {}),
          };
          const inch = Object.fromEntries(Object.entries(mm).map(([key, value]) => [key, value / MM_PER_INCH]));
          const a = fixed(mm).outputs;
          const b = fixed(inch, 'in').outputs;
          expect(Math.abs(a.holeSize - b.holeSize * MM_PER_INCH)).toBeLessThanOrEqual(0.00005 + 0.000127 + 1e-9);
          expect(Math.abs(a.projectionFactor - b.projectionFactor)).toBeLessThanOrEqual(1e-6);
        },
      ),
    );
  });
});
