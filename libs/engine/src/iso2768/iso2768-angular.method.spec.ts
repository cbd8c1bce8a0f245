import { describe, expect, it } from 'vitest';
import { findMethod } from '../registry.js';
import { degreesMinutesText, iso2768AngularMethod, type Iso2768AngularOutputs } from './iso2768-angular.method.js';

const outputsOf = (inputs: Record<string, unknown>, unit: 'mm' | 'in' = 'mm') =>
  iso2768AngularMethod.evaluate(iso2768AngularMethod.inputSchema.parse(inputs), { unit }).outputs as Iso2768AngularOutputs;

describe('iso2768-angular method', () => {
  // [C] ISO 2768-1 Table 3 (team reference sheet §3), except class v over 400 mm [M: from memory]
  it.each([
    ['f', [60, 30, 20, 10, 5]],
    ['m', [60, 30, 20, 10, 5]],
    ['c', [90, 60, 30, 15, 10]],
    ['v', [180, 120, 60, 30, 20]],
  ] as const)('class %s by shorter leg ≤10, 10–50, 50–120, 120–400, >400 mm', (toleranceClass, minutes) => {
    expect([10, 10.5, 120, 400, 400.5].map((leg) => outputsOf({ shorterLegLength: leg, class: toleranceClass }).deviationMinutes)).toEqual(minutes);
  });

  it('writes degrees and minutes as a drawing does', () => {
    expect(outputsOf({ shorterLegLength: 30, designation: 'ISO 2768-mK' })).toEqual({
      toleranceClass: 'm', deviationMinutes: 30, deviationDegrees: 0.5, deviationText: '±0°30′', sizeRange: { over: 10, upTo: 50 },
    });
    expect([degreesMinutesText(90), degreesMinutesText(180), degreesMinutesText(5)]).toEqual(['1°30′', '3°', '0°5′']);
  });

  it('selects the row from a leg given in inches (2 in = 50.8 mm: 50–120)', () => {
    expect(outputsOf({ shorterLegLength: 2, class: 'c' }, 'in').deviationMinutes).toBe(30);
  });

  it('is registered', () => {
    expect(findMethod('iso2768-angular')).toBe(iso2768AngularMethod);
  });
});
