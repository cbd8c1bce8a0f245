import { describe, expect, it } from 'vitest';
import { findMethod } from '../registry.js';
import { iso2768GeometricMethod, type Iso2768GeometricOutputs } from './iso2768-geometric.method.js';
import { engineError } from './iso2768-test-helpers.js';

const run = (inputs: Record<string, unknown>, unit: 'mm' | 'in' = 'mm') =>
  iso2768GeometricMethod.evaluate(iso2768GeometricMethod.inputSchema.parse(inputs), { unit });
const tolerance = (characteristic: string, length: number | undefined, toleranceClass: string) =>
  (run({ characteristic, length, class: toleranceClass }).outputs as Iso2768GeometricOutputs).tolerance;

describe('iso2768-geometric method', () => {
  // [C] ISO 2768-2 Table 1 (team reference sheet §3): lengths ≤10, 10–30, 30–100, 100–300, 300–1000, 1000–3000
  it.each([
    ['H', [0.02, 0.05, 0.1, 0.2, 0.3, 0.4]],
    ['K', [0.05, 0.1, 0.2, 0.4, 0.6, 0.8]],
    ['L', [0.1, 0.2, 0.4, 0.8, 1.2, 1.6]],
  ] as const)('straightness and flatness, class %s [C: ISO 2768-2 Table 1]', (toleranceClass, values) => {
    const lengths = [10, 30, 100, 300, 1000, 3000];
    expect(lengths.map((length) => tolerance('straightness', length, toleranceClass))).toEqual(values);
    expect(lengths.slice(0, 5).map((length) => tolerance('flatness', length + 0.001, toleranceClass))).toEqual(values.slice(1));
  });

  it.each([
    ['H', [0.2, 0.3, 0.4, 0.5]],
    ['K', [0.4, 0.6, 0.8, 1]],
    ['L', [0.6, 1, 1.5, 2]],
  ] as const)('perpendicularity by the shorter side, class %s [C: ISO 2768-2 Table 2]', (toleranceClass, values) => {
    expect([100, 300, 1000, 3000].map((length) => tolerance('perpendicularity', length, toleranceClass))).toEqual(values);
  });

  it.each([
    ['H', [0.5, 0.5, 0.5, 0.5]],
    ['K', [0.6, 0.6, 0.8, 1]],
    ['L', [0.6, 1, 1.5, 2]],
  ] as const)('symmetry, class %s [M: ISO 2768-2 Table 3 from memory]', (toleranceClass, values) => {
    expect([50, 200, 500, 2000].map((length) => tolerance('symmetry', length, toleranceClass))).toEqual(values);
    expect(run({ characteristic: 'symmetry', length: 50, class: toleranceClass }).warnings).toEqual([expect.stringMatching(/from memory/)]);
  });

  it('circular run-out has one value per class [C: ISO 2768-2 Table 4]', () => {
    expect(['H', 'K', 'L'].map((toleranceClass) => tolerance('circular-run-out', undefined, toleranceClass))).toEqual([0.1, 0.2, 0.5]);
    expect(run({ characteristic: 'circular-run-out', designation: 'ISO 2768-mK' }).outputs).toMatchObject({ toleranceClass: 'K', tolerance: 0.2, sizeRange: null });
  });

  it('refuses lengths over 3000 mm and a designation without a geometric class', () => {
    expect(engineError(() => run({ characteristic: 'flatness', length: 3000.5, class: 'K' })).fields.length).toMatch(/only up to 3000 mm/);
    expect(engineError(() => run({ characteristic: 'flatness', length: 50, designation: 'ISO 2768-m' })).fields.designation).toMatch(/no a geometric class/);
    expect(() => iso2768GeometricMethod.inputSchema.parse({ characteristic: 'flatness', class: 'K' })).toThrow(/length/);
  });

  it('converts to inches: flatness K over 100 mm = 0.4 mm = 0.015748 in [D]', () => {
    expect(run({ characteristic: 'flatness', length: 8, class: 'K' }, 'in').outputs).toMatchObject({ tolerance: 0.015748, sizeRange: { over: 3.9370079, upTo: 11.8110236 } });
  });

  it('is registered', () => {
    expect(findMethod('iso2768-geometric')).toBe(iso2768GeometricMethod);
  });
});
