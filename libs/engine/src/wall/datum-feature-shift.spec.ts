import { describe, expect, it } from 'vitest';
import { materialConditionSizes } from '../boundary/material-condition-sizes.js';
import { roundTo } from '../core/units.js';
import { datumFeatureShift } from './datum-feature-shift.js';

describe('datumFeatureShift', () => {
  const boss = materialConditionSizes('external', 29.9, 30.1);
  const bore = materialConditionSizes('internal', 19.9, 20.1);

  // Shift = departure of the datum feature from its MMB or LMB (reference.md §4 [C]).
  it('grows as the datum feature departs from MMB', () => {
    expect(datumFeatureShift(30.1, 'MMB', boss)).toBe(0);
    expect(roundTo(datumFeatureShift(29.95, 'MMB', boss), 6)).toBe(0.15);
    expect(roundTo(datumFeatureShift(20.05, 'MMB', bore), 6)).toBe(0.15);
  });

  it('grows as the datum feature departs from LMB', () => {
    expect(datumFeatureShift(29.9, 'LMB', boss)).toBe(0);
    expect(roundTo(datumFeatureShift(30.1, 'LMB', boss), 6)).toBe(0.2);
    expect(roundTo(datumFeatureShift(19.9, 'LMB', bore), 6)).toBe(0.2);
  });

  it('is zero at RMB', () => {
    expect(datumFeatureShift(29.9, 'RMB', boss)).toBe(0);
  });
});
