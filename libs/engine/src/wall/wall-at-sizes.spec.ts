import { describe, expect, it } from 'vitest';
import { materialConditionSizes } from '../boundary/material-condition-sizes.js';
import { roundTo } from '../core/units.js';
import { wallAtSizes, type WallModel } from './wall-at-sizes.js';

// reference.md §5 coaxial example [D]: boss Ø30 ±0.1 (datum), bore Ø20 ±0.1, position Ø0.2.
const model = (toleranceModifier: WallModel['toleranceModifier'], datumModifier: WallModel['datumModifier']): WallModel => ({
  geometry: { kind: 'inside', basicDistance: 0, outer: 'datum' },
  feature: materialConditionSizes('internal', 19.9, 20.1),
  datum: materialConditionSizes('external', 29.9, 30.1),
  positionTolerance: 0.2,
  toleranceModifier,
  datumModifier,
});

const rounded = (value: number) => roundTo(value, 6);

describe('wallAtSizes', () => {
  it('keeps bonus and datum feature shift apart and adds both to the allowance (MMC/MMB at LMC sizes)', () => {
    const wall = wallAtSizes(model('MMC', 'MMB'), 20.1, 29.9);
    expect(rounded(wall.bonus)).toBe(0.2);
    expect(rounded(wall.datumShift)).toBe(0.2);
    expect(rounded(wall.positionAllowance)).toBe(0.6);
    expect(rounded(wall.offsetAllowance)).toBe(0.3);
    expect(rounded(wall.thinnest)).toBe(4.6);
    expect(rounded(wall.thickest)).toBe(5.2);
    expect(rounded(wall.offsetAtThinnest)).toBe(0.3);
  });

  it('LMC/LMB at MMC sizes returns as offset exactly what the sizes add to the wall: 4.80', () => {
    const wall = wallAtSizes(model('LMC', 'LMB'), 19.9, 30.1);
    expect(rounded(wall.bonus + wall.datumShift)).toBe(0.4);
    expect(rounded(wall.thinnest)).toBe(4.8);
  });

  it('RFS/RMB at MMC sizes: 5.00', () => {
    expect(rounded(wallAtSizes(model('RFS', 'RMB'), 19.9, 30.1).thinnest)).toBe(5);
  });
});
