import { describe, expect, it } from 'vitest';
import { formatLength, formatNumber, fromMm, latexLength, roundTo, toMm } from './units.js';

describe('units', () => {
  it('removes binary noise from differences of decimal inputs', () => {
    expect(roundTo(10.2 - 10.0, 4)).toBe(0.2);
    expect(formatLength(10.2 - 10.0, 'mm')).toBe('0.2');
    expect(formatLength(0.1 + 0.2, 'mm')).toBe('0.3');
  });

  it('rounds halves away from zero, both signs', () => {
    expect(roundTo(1.00005, 4)).toBe(1.0001);
    expect(roundTo(-1.00005, 4)).toBe(-1.0001);
    expect(roundTo(2.675, 2)).toBe(2.68);
    expect(roundTo(-0.00001, 4)).toBe(0);
  });

  it('converts inch and mm exactly by 25.4 (ISO 31-1 / NIST SP 811 definition of the inch)', () => {
    expect(toMm(1, 'in')).toBe(25.4);
    expect(fromMm(25.4, 'in')).toBe(1);
    expect(formatLength(fromMm(10.2, 'in'), 'in')).toBe('0.40157');
  });

  it('formats numbers without trailing zeros and LaTeX lengths with units', () => {
    expect(formatNumber(3)).toBe('3');
    expect(formatNumber(1.5)).toBe('1.5');
    expect(latexLength(-0.025, 'mm', true)).toBe('\\left(-0.025\\,\\text{mm}\\right)');
  });
});
