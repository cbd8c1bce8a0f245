import { describe, expect, it } from 'vitest';
import { deviationsMicrometres as shaft } from './iso286-test-helpers.js';

// Each value is [es, ei] in µm. Tags: [C] confirmed in a published reproduction (team reference sheet),
// [D] derived from [C] data by ISO 286-1's rule ei = es − IT / es = ei + IT, [M] from memory of the
// ISO 286-2 tables (matching two open-source reproductions of ISO 286-1 Tables 2–3).
describe('shaftLimitDeviations', () => {
  it.each([
    // Machine Drawing (Narayana et al.) Table 15.2 fundamental deviations [C], other limit by IT [D]
    ['c11', 5, [-70, -145]],
    ['c11', 40, [-120, -280]],
    ['c11', 45, [-130, -290]],
    ['d9', 25, [-65, -117]],
    ['d10', 60, [-100, -220]],
    ['e8', 100, [-72, -126]],
    ['e9', 15, [-32, -75]],
    ['f7', 30, [-20, -41]],
    ['f7', 30.001, [-25, -50]],
    ['g6', 10, [-5, -14]],
    ['g6', 10.001, [-6, -17]],
    ['g6', 50, [-9, -25]],
    ['h6', 25, [0, -13]],
    ['h11', 100, [0, -220]],
    ['k6', 50, [18, 2]],
    ['k6', 100, [25, 3]],
    ['m6', 50, [25, 9]],
    ['n6', 100, [45, 23]],
    ['p6', 10, [24, 15]],
    ['r6', 65, [60, 41]],
    ['r6', 65.001, [62, 43]],
    ['s6', 50, [59, 43]],
    ['s6', 80, [78, 59]],
    ['s6', 100, [93, 71]],
  ] as const)('%s at %s mm [C fundamental deviation, D other limit]', (designation, size, expected) => {
    expect(shaft(designation, size)).toEqual(expected);
  });

  it('applies the k grade rule: the tabulated ei for IT4–IT7 only, 0 otherwise [C rule: reference sheet §2; D values]', () => {
    expect(shaft('k6', 3)).toEqual([6, 0]);
    expect(shaft('k6', 3.001)).toEqual([9, 1]);
    expect(shaft('k4', 50)).toEqual([9, 2]);
    expect(shaft('k7', 50)).toEqual([27, 2]);
    expect(shaft('k3', 50)).toEqual([4, 0]);
    expect(shaft('k8', 50)).toEqual([39, 0]);
    expect(shaft('k6', 600)).toEqual([44, 0]);
  });

  it('makes js symmetric: ±IT/2, odd IT of grades 7–11 rounded to even [C: Machine Drawing Table 15.2 footnote; js6 value D]', () => {
    expect(shaft('js7', 25)).toEqual([10, -10]);
    expect(shaft('js6', 25)).toEqual([6.5, -6.5]);
    expect(shaft('js9', 2)).toEqual([12, -12]);
    expect(shaft('js12', 25)).toEqual([105, -105]);
    expect(shaft('js3', 5)).toEqual([1.25, -1.25]);
  });

  it.each([
    // [M] ISO 286-2 tables from memory, cross-checked against two open-source reproductions
    ['a11', 100, [-380, -600]],
    ['b11', 200, [-340, -630]],
    ['cd7', 5, [-46, -58]],
    ['ef8', 8, [-18, -40]],
    ['fg6', 2, [-4, -10]],
    ['d9', 600, [-260, -435]],
    ['e8', 1200, [-195, -360]],
    ['f7', 3150, [-145, -355]],
    ['g6', 2000, [-32, -124]],
    ['h7', 3150, [0, -210]],
    ['m6', 600, [70, 26]],
    ['n6', 2400, [220, 110]],
    ['p6', 1000, [156, 100]],
    ['r6', 1000, [276, 220]],
    ['s6', 2600, [1385, 1250]],
    ['t6', 30, [54, 41]],
    ['u6', 16, [44, 33]],
    ['v6', 16, [50, 39]],
    ['x7', 20, [75, 54]],
    ['y6', 20, [76, 63]],
    ['z8', 10, [64, 42]],
    ['za7', 45, [205, 180]],
    ['zb8', 100, [499, 445]],
    ['zc9', 500, [2755, 2600]],
    ['j5', 10, [4, -2]],
    ['j6', 2, [4, -2]],
    ['j6', 300, [16, -16]],
    ['j7', 350, [29, -28]],
    ['j8', 2, [8, -6]],
  ] as const)('%s at %s mm [M]', (designation, size, expected) => {
    expect(shaft(designation, size)).toEqual(expected);
  });

  it('carries the ISO 286-2 corrigendum cell f9 at 250–315 mm: lower deviation −186, not −185 [C: reference sheet §2]', () => {
    expect(shaft('f9', 300)).toEqual([-56, -186]);
  });

  it.each([
    ['a11', 1, /a are not used for nominal sizes up to 1 mm/],
    ['b9', 0.5, /b are not used/],
    ['h14', 1, /IT14 to IT18 for nominal sizes up to 1 mm/],
    ['h18', 0.8, /IT14 to IT18/],
    ['c11', 500.001, /c only up to 500 mm/],
    ['a11', 600, /a only up to 500 mm/],
    ['cd7', 10.001, /cd only up to 10 mm/],
    ['ef7', 12, /ef only up to 10 mm/],
    ['fg6', 11, /fg only up to 10 mm/],
    ['t6', 24, /t only over 24 mm up to 3150 mm/],
    ['v6', 14, /v only over 14 mm up to 500 mm/],
    ['y6', 18, /y only over 18 mm up to 500 mm/],
    ['zc9', 500.001, /zc only up to 500 mm/],
    ['j4', 10, /j only as j5, j6 and j7/],
    ['j8', 3.001, /j8 up to 3 mm/],
    ['j6', 600, /up to 500 mm/],
    ['h01', 600, /IT01 only up to 500 mm/],
  ] as const)('refuses %s at %s mm as not defined', (designation, size, message) => {
    expect(shaft(designation, size)).toMatch(message);
  });

  it('accepts the same classes just past the limits that define them', () => {
    expect(shaft('a11', 1.001)).toEqual([-270, -330]);
    expect(shaft('h14', 1.001)).toEqual([0, -250]);
    expect(shaft('t6', 24.001)).toEqual([54, 41]);
    expect(shaft('cd7', 10)).toEqual([-56, -71]);
  });
});
