import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { MM_PER_INCH } from '../core/units.js';
import { evaluateMethod } from '../registry.js';
import { featureBoundaryMethod, type FeatureBoundaryOutputs } from './feature-boundary-method.js';

const run = (inputs: unknown, unit: 'mm' | 'in' = 'mm') => {
  const result = evaluateMethod(featureBoundaryMethod, inputs, unit);
  return { ...result, outputs: result.outputs as unknown as FeatureBoundaryOutputs };
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

describe('feature-boundary method', () => {
  // reference.md §4 worked numbers [D], from the ASME Y14.5-2018 boundary table.
  it('hole Ø10.0–10.2, position Ø0.1 at MMC', () => {
    const { outputs, warnings } = run({ featureType: 'internal', lowerLimit: 10, upperLimit: 10.2, tolerance: 0.1, modifier: 'MMC' });
    expect(outputs).toMatchObject({
      mmcSize: 10,
      lmcSize: 10.2,
      sizeTolerance: 0.2,
      virtualCondition: 9.9,
      resultantCondition: 10.5,
      innerBoundary: 9.9,
      outerBoundary: 10.5,
      maxBonus: 0.2,
    });
    expect(outputs.bonusTable.at(-1)).toEqual({ actualSize: 10.2, bonus: 0.2, totalTolerance: 0.3 });
    expect(warnings).toEqual([]);
  });

  it('pin Ø9.8–10.0, position Ø0.1 at LMC (reference.md §4 [D])', () => {
    const { outputs } = run({ featureType: 'external', lowerLimit: 9.8, upperLimit: 10, tolerance: 0.1, modifier: 'LMC' });
    expect(outputs).toMatchObject({ mmcSize: 10, lmcSize: 9.8, virtualCondition: 9.7, resultantCondition: 10.3, innerBoundary: 9.7, outerBoundary: 10.3 });
  });

  it('at RFS returns null virtual and resultant condition with a warning, the worst-case boundaries and no bonus (reference.md §4 [D])', () => {
    const { outputs, warnings, steps } = run({ featureType: 'internal', lowerLimit: 10, upperLimit: 10.2, tolerance: 0.1, modifier: 'RFS' });
    expect(outputs).toMatchObject({ virtualCondition: null, resultantCondition: null, innerBoundary: 9.9, outerBoundary: 10.3, maxBonus: 0 });
    expect(outputs.bonusTable.every((row) => row.totalTolerance === 0.1)).toBe(true);
    expect(warnings.join(' ')).toMatch(/RFS/);
    expect(steps.map((step) => step.label)).toContain('Virtual and resultant condition');
  });

  // reference.md §4 inch example [C]: hole .073–.077, position .005 at LMC → outer .082, inner .064.
  it('inch hole .073–.077 at LMC', () => {
    const { outputs } = run({ featureType: 'internal', lowerLimit: 0.073, upperLimit: 0.077, tolerance: 0.005, modifier: 'LMC' }, 'in');
    expect(outputs).toMatchObject({ virtualCondition: 0.082, outerBoundary: 0.082, resultantCondition: 0.064, innerBoundary: 0.064, maxBonus: 0.004 });
  });

  it('shows every formula with numbers substituted', () => {
    const { steps } = run({ featureType: 'internal', lowerLimit: 10, upperLimit: 10.2, tolerance: 0.1, modifier: 'MMC' });
    const byLabel = Object.fromEntries(steps.map((step) => [step.label, step]));
    expect(byLabel['Virtual condition']).toEqual({ label: 'Virtual condition', latex: '\\mathrm{VC} = \\mathrm{MMC} - t = 10 - 0.1 = 9.9', value: '9.9 mm' });
    expect(byLabel['Resultant condition']?.latex).toBe('\\mathrm{RC} = \\mathrm{LMC} + (t + T_s) = 10.2 + (0.1 + 0.2) = 10.5');
    expect(byLabel['Size tolerance']?.latex).toBe('T_s = 10.2 - 10 = 0.2');
  });

  it('refuses inverted limits and a negative tolerance, one message per field', () => {
    expect(fieldsOf({ featureType: 'internal', lowerLimit: 10.2, upperLimit: 10, tolerance: -0.1, modifier: 'MMC' })).toEqual({
      'inputs.lowerLimit': 'Lower limit must not exceed the upper limit',
      'inputs.tolerance': 'Geometric tolerance must not be negative',
    });
    expect(fieldsOf({ featureType: 'slot', lowerLimit: 10, upperLimit: 10.2, tolerance: 0.1, modifier: 'MMB' })).toEqual({
      'inputs.featureType': 'Feature type must be internal or external',
      'inputs.modifier': 'Modifier must be MMC, LMC or RFS',
    });
  });

  it('warns when the tolerance swallows the feature', () => {
    const { warnings } = run({ featureType: 'external', lowerLimit: 0.5, upperLimit: 0.6, tolerance: 0.6, modifier: 'MMC' });
    expect(warnings.join(' ')).toMatch(/inner boundary is not positive/);
  });

  it('gives the same boundaries in mm and in inch', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('internal' as const, 'external' as const),
        fc.constantFrom('MMC' as const, 'LMC' as const, 'RFS' as const),
        fc.integer({ min: 1000, max: 200_000 }),
        fc.integer({ min: 0, max: 2000 }),
        fc.integer({ min: 0, max: 2000 }),
        (featureType, modifier, lowerMicrons, sizeMicrons, toleranceMicrons) => {
          const mm = { featureType, modifier, lowerLimit: lowerMicrons / 1000, upperLimit: (lowerMicrons + sizeMicrons) / 1000, tolerance: toleranceMicrons / 1000 };
          const inch = { ...mm, lowerLimit: mm.lowerLimit / MM_PER_INCH, upperLimit: mm.upperLimit / MM_PER_INCH, tolerance: mm.tolerance / MM_PER_INCH };
          const inMm = run(mm).outputs;
          const inInch = run(inch, 'in').outputs;
          // Inch outputs are rounded to 0.00001 in = 0.000254 mm; mm outputs to 0.0001 mm.
          const agree = (a: number | null, b: number | null) => (a === null ? b === null : Math.abs(a - (b as number) * MM_PER_INCH) <= 0.000127 + 0.00005 + 1e-9);
          for (const key of ['mmcSize', 'lmcSize', 'virtualCondition', 'resultantCondition', 'innerBoundary', 'outerBoundary', 'maxBonus'] as const) {
            expect(agree(inMm[key], inInch[key])).toBe(true);
          }
        },
      ),
    );
  });
});
