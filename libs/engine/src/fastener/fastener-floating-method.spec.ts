import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { MM_PER_INCH } from '../core/units.js';
import { evaluateMethod } from '../registry.js';
import { fastenerFloatingMethod, type FastenerFloatingOutputs } from './fastener-floating-method.js';

const floating = (inputs: unknown, unit: 'mm' | 'in' = 'mm') => {
  const result = evaluateMethod(fastenerFloatingMethod, inputs, unit);
  return { ...result, outputs: result.outputs as unknown as FastenerFloatingOutputs };
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

describe('fastener-floating method', () => {
  // T = H − F (reference.md §6 [C]); M10, F 10.0, H 10.5 → 0.5 (reference.md §6 [D]).
  it('solves whichever quantity is left empty and names it', () => {
    expect(floating({ holeSize: 10.5, fastenerSize: 10 }).outputs).toEqual({ solvedFor: 'positionTolerance', holeSize: 10.5, fastenerSize: 10, positionTolerance: 0.5 });
    expect(floating({ fastenerSize: 10, positionTolerance: 0.5 }).outputs.holeSize).toBe(10.5);
    expect(floating({ holeSize: 10.5, positionTolerance: 0.5 }).outputs.fastenerSize).toBe(10);
  });

  it('works in inch: .250 fastener in a .266 hole → .016 (derived from T = H − F)', () => {
    expect(floating({ holeSize: 0.266, fastenerSize: 0.25 }, 'in').outputs.positionTolerance).toBe(0.016);
  });

  it('shows the substituted formula', () => {
    const { steps } = floating({ holeSize: 10.5, fastenerSize: 10 });
    expect(steps.at(-1)).toEqual({ label: 'Position tolerance', latex: 'T = H - F = 10.5 - 10 = 0.5', value: '0.5 mm' });
  });

  it('asks for exactly one unknown, per field', () => {
    expect(Object.keys(fieldsOf(() => floating({ holeSize: 10.5, fastenerSize: 10, positionTolerance: 0.5 })))).toEqual([
      'inputs.holeSize',
      'inputs.fastenerSize',
      'inputs.positionTolerance',
    ]);
    expect(fieldsOf(() => floating({ holeSize: 10.5 }))).toEqual({
      'inputs.fastenerSize': 'Fastener size is required: only one of hole size, fastener size and position tolerance may be left empty',
      'inputs.positionTolerance': 'Position tolerance is required: only one of hole size, fastener size and position tolerance may be left empty',
    });
    expect(fieldsOf(() => floating({ fastenerSize: 10, positionTolerance: -0.1 }))).toEqual({ 'inputs.positionTolerance': 'Position tolerance must not be negative' });
  });

  it('refuses a hole smaller than the fastener with a field message', () => {
    expect(fieldsOf(() => floating({ holeSize: 9.5, fastenerSize: 10 }))).toEqual({
      'inputs.holeSize': 'The clearance hole at MMC is smaller than the fastener at MMC: no position tolerance remains',
    });
  });

  it('round-trips: solving for any quantity returns the other two unchanged', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1000, max: 50_000 }), fc.integer({ min: 0, max: 3000 }), (fastenerMicrons, toleranceMicrons) => {
        const holeSize = floating({ fastenerSize: fastenerMicrons / 1000, positionTolerance: toleranceMicrons / 1000 }).outputs.holeSize;
        expect(floating({ holeSize, fastenerSize: fastenerMicrons / 1000 }).outputs.positionTolerance).toBe(toleranceMicrons / 1000);
        expect(floating({ holeSize, positionTolerance: toleranceMicrons / 1000 }).outputs.fastenerSize).toBe(fastenerMicrons / 1000);
      }),
    );
  });

  it('gives the same tolerance in mm and inch', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1000, max: 50_000 }), fc.integer({ min: 0, max: 3000 }), (fastenerMicrons, clearanceMicrons) => {
        const mm = { fastenerSize: fastenerMicrons / 1000, holeSize: (fastenerMicrons + clearanceMicrons) / 1000 };
        const inch = { fastenerSize: mm.fastenerSize / MM_PER_INCH, holeSize: mm.holeSize / MM_PER_INCH };
        const difference = floating(mm).outputs.positionTolerance - floating(inch, 'in').outputs.positionTolerance * MM_PER_INCH;
        expect(Math.abs(difference)).toBeLessThanOrEqual(0.00005 + 0.000127 + 1e-9);
      }),
    );
  });
});
