import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findMethod } from '../registry.js';
import { iso2768Method, type Iso2768Outputs } from './iso2768.method.js';
import { engineError } from './iso2768-test-helpers.js';

const run = (inputs: Record<string, unknown>, unit: 'mm' | 'in' = 'mm') => iso2768Method.evaluate(iso2768Method.inputSchema.parse(inputs), { unit });
const outputsOf = (inputs: Record<string, unknown>, unit: 'mm' | 'in' = 'mm') => run(inputs, unit).outputs as Iso2768Outputs;

describe('iso2768 method (linear sizes)', () => {
  // [C] ISO 2768-1:1989 Table 1, several reproductions agree (team reference sheet §3)
  const table: [number, Record<'f' | 'm' | 'c' | 'v', number | null>][] = [
    [0.5, { f: 0.05, m: 0.1, c: 0.2, v: null }],
    [3, { f: 0.05, m: 0.1, c: 0.2, v: null }],
    [3.001, { f: 0.05, m: 0.1, c: 0.3, v: 0.5 }],
    [6, { f: 0.05, m: 0.1, c: 0.3, v: 0.5 }],
    [6.001, { f: 0.1, m: 0.2, c: 0.5, v: 1 }],
    [30, { f: 0.1, m: 0.2, c: 0.5, v: 1 }],
    [30.001, { f: 0.15, m: 0.3, c: 0.8, v: 1.5 }],
    [120, { f: 0.15, m: 0.3, c: 0.8, v: 1.5 }],
    [250, { f: 0.2, m: 0.5, c: 1.2, v: 2.5 }],
    [400.001, { f: 0.3, m: 0.8, c: 2, v: 4 }],
    [1500, { f: 0.5, m: 1.2, c: 3, v: 6 }],
    [2000.5, { f: null, m: 2, c: 4, v: 8 }],
    [4000, { f: null, m: 2, c: 4, v: 8 }],
  ];
  it.each(table)('at %s mm [C: ISO 2768-1 Table 1]', (size, expected) => {
    for (const toleranceClass of ['f', 'm', 'c', 'v'] as const) {
      const value = expected[toleranceClass];
      if (value === null) {
        expect(engineError(() => run({ nominalSize: size, class: toleranceClass })).code).toBe('NOT_DEFINED_BY_STANDARD');
      } else {
        expect(outputsOf({ nominalSize: size, class: toleranceClass })).toMatchObject({ upperDeviation: value, lowerDeviation: -value });
      }
    }
  });

  it('gives limits and the size range without float noise', () => {
    expect(outputsOf({ nominalSize: 25.4, class: 'm' })).toEqual({
      toleranceClass: 'm', feature: 'linear', upperDeviation: 0.2, lowerDeviation: -0.2, maxSize: 25.6, minSize: 25.2, sizeRange: { over: 6, upTo: 30 },
    });
  });

  it('says below 0.5 mm that the deviation must be stated beside the size [C: ISO 2768-1 Table 1 note]', () => {
    const error = engineError(() => run({ nominalSize: 0.4, class: 'm' }));
    expect(error.code).toBe('NOT_DEFINED_BY_STANDARD');
    expect(error.fields.nominalSize).toMatch(/below 0\.5 mm: state the deviation beside the size/);
  });

  it('refuses class v from 0.5 to 3 mm and class f over 2000 mm on the class field, and sizes over 4000 mm', () => {
    expect(engineError(() => run({ nominalSize: 2, class: 'v' })).fields.class).toMatch(/no class v \(very coarse\) tolerance for 0\.5 up to 3 mm/);
    expect(engineError(() => run({ nominalSize: 2500, designation: 'ISO 2768-fH' })).fields.designation).toMatch(/no class f/);
    expect(engineError(() => run({ nominalSize: 4000.1, class: 'c' })).fields.nominalSize).toMatch(/up to 4000 mm/);
  });

  it('reads the class from a title-block designation, and refuses a contradiction', () => {
    expect(outputsOf({ nominalSize: 50, designation: 'ISO 2768-mK' })).toMatchObject({ toleranceClass: 'm', upperDeviation: 0.3 });
    expect(engineError(() => run({ nominalSize: 50, class: 'f', designation: 'ISO 2768-mK' })).fields.class).toMatch(/contradicts/);
    expect(engineError(() => run({ nominalSize: 50, designation: 'ISO 2768-K' })).fields.designation).toMatch(/no a linear class/);
    expect(run({ nominalSize: 50, designation: 'ISO 2768-mK-E' }).warnings).toEqual([expect.stringMatching(/envelope/)]);
    expect(() => iso2768Method.inputSchema.parse({ nominalSize: 50 })).toThrow(/tolerance class/);
  });

  it('gives radii and chamfer heights from Table 2 [C: ISO 2768-1 Table 2, reference sheet §3]', () => {
    const radius = (size: number, toleranceClass: string) => outputsOf({ nominalSize: size, class: toleranceClass, feature: 'radius-chamfer' }).upperDeviation;
    expect([radius(0.5, 'f'), radius(3, 'm'), radius(4, 'm'), radius(6.5, 'f'), radius(100, 'm')]).toEqual([0.2, 0.2, 0.5, 1, 1]);
    expect([radius(2, 'c'), radius(5, 'v'), radius(500, 'c')]).toEqual([0.4, 1, 2]);
    expect(engineError(() => run({ nominalSize: 0.3, class: 'm', feature: 'radius-chamfer' })).fields.nominalSize).toMatch(/radius or chamfer height below 0\.5 mm/);
  });

  it('answers in inches: 1 in = 25.4 mm, class m ±0.2 mm = ±0.0078740 in [D]', () => {
    const outputs = outputsOf({ nominalSize: 1, class: 'm' }, 'in');
    expect(outputs).toMatchObject({ upperDeviation: 0.007874, lowerDeviation: -0.007874, maxSize: 1.007874, sizeRange: { over: 0.2362205, upTo: 1.1811024 } });
  });

  it('gives the same deviation in mm and in inches (property)', () => {
    fc.assert(
      // Sizes to 0.001 mm: within 1e-9 mm of a bound an inch size is snapped onto the bound (float noise of × 25.4).
      fc.property(fc.integer({ min: 500, max: 4_000_000 }).map((thousandths) => thousandths / 1000), fc.constantFrom('m', 'c'), (size, toleranceClass) => {
        const mm = outputsOf({ nominalSize: size, class: toleranceClass });
        const inch = outputsOf({ nominalSize: size / 25.4, class: toleranceClass }, 'in');
        expect(Math.abs(inch.upperDeviation * 25.4 - mm.upperDeviation)).toBeLessThanOrEqual(0.5e-7 * 25.4 + 1e-12);
        expect(mm.upperDeviation).toBe(-mm.lowerDeviation);
      }),
    );
  });

  it('is registered', () => {
    expect(findMethod('iso2768')).toBe(iso2768Method);
  });
});
