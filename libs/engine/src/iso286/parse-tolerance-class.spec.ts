import { describe, expect, it } from 'vitest';
import { parseToleranceClass } from './parse-tolerance-class.js';

describe('parseToleranceClass', () => {
  it('reads letters and grades, case carrying the side', () => {
    expect(parseToleranceClass('H7', 'hole')).toEqual({ ok: true, value: { side: 'hole', letter: 'H', grade: '7', designation: 'H7' } });
    expect(parseToleranceClass(' js6 ', 'shaft')).toMatchObject({ ok: true, value: { letter: 'js', grade: '6', designation: 'js6' } });
    expect(parseToleranceClass('ZC11', 'hole')).toMatchObject({ ok: true, value: { letter: 'ZC', grade: '11' } });
    expect(parseToleranceClass('h01', 'shaft')).toMatchObject({ ok: true, value: { letter: 'h', grade: '01' } });
    expect(parseToleranceClass('K0', 'hole')).toMatchObject({ ok: true, value: { grade: '0' } });
    expect(parseToleranceClass('zb18', 'shaft')).toMatchObject({ ok: true, value: { letter: 'zb', grade: '18' } });
  });

  it('refuses a lower-case letter as a hole, saying holes use capitals', () => {
    const result = parseToleranceClass('h7', 'hole');
    expect(result).toMatchObject({ ok: false });
    expect(!result.ok && result.message).toMatch(/Holes use capital letters: write H7/);
  });

  it('refuses a capital letter as a shaft', () => {
    const result = parseToleranceClass('G6', 'shaft');
    expect(!result.ok && result.message).toMatch(/Shafts use lower-case letters: write g6/);
  });

  it.each([
    ['W7', 'hole', /no fundamental deviation "W"/],
    ['i6', 'shaft', /no fundamental deviation "i"/],
    ['Js7', 'hole', /mixed case/],
    ['H19', 'hole', /not a standard tolerance grade/],
    ['H00', 'hole', /not a standard tolerance grade/],
    ['H', 'hole', /not a tolerance class/],
    ['7H', 'hole', /not a tolerance class/],
    ['H7/g6', 'hole', /not a tolerance class/],
    ['', 'shaft', /Give a shaft tolerance class/],
  ] as const)('refuses %s as a %s', (text, side, message) => {
    const result = parseToleranceClass(text, side);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.message).toMatch(message);
  });
});
