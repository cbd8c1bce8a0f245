import { describe, expect, it } from 'vitest';
import { deviationsMicrometres as hole } from './iso286-test-helpers.js';

// Each value is [ES, EI] in µm.
describe('holeLimitDeviations', () => {
  it.each([
    // [C] a tooling maker's metric tolerance tables (holes), rows 18–30, 30–50, 80–100, 10 mm column D (team reference sheet §2)
    ['K6', 10, [2, -7]],
    ['K6', 50, [3, -13]],
    ['K6', 100, [4, -18]],
    ['M6', 10, [-3, -12]],
    ['M6', 50, [-4, -20]],
    ['M6', 100, [-6, -28]],
    ['M8', 10, [1, -21]],
    ['M8', 50, [5, -34]],
    ['M8', 100, [6, -48]],
    ['N6', 10, [-7, -16]],
    ['N6', 50, [-12, -28]],
    ['N6', 100, [-16, -38]],
    ['N8', 10, [-3, -25]],
    ['N8', 50, [-3, -42]],
    ['N8', 100, [-4, -58]],
  ] as const)('%s at %s mm, K/M/N with Δ [C]', (designation, size, expected) => {
    expect(hole(designation, size)).toEqual(expected);
  });

  it('mirrors A–H from the shaft: EI = −es [C rule: reference sheet §2; D values]', () => {
    expect(hole('H7', 10)).toEqual([15, 0]);
    expect(hole('H7', 50)).toEqual([25, 0]);
    expect(hole('G7', 10)).toEqual([20, 5]);
    expect(hole('F8', 30)).toEqual([53, 20]);
    expect(hole('D10', 60)).toEqual([220, 100]);
    expect(hole('C11', 45)).toEqual([290, 130]);
  });

  it('carries the ISO 286-2 corrigendum cells A13 315–355, E8 80–120 and R10 18–30 [C: reference sheet §2]', () => {
    expect(hole('A13', 320)).toEqual([2090, 1200]);
    expect(hole('E8', 100)).toEqual([126, 72]);
    expect(hole('R10', 25)?.[0]).toBe(-28);
    expect(hole('R10', 25)).toEqual([-28, -112]);
  });

  it('takes ES = −9 µm for M6 at 250–315 mm, the stated exception [C: Machine Drawing Table 15.3 footnote]', () => {
    expect(hole('M6', 300)).toEqual([-9, -41]);
    expect(hole('M6', 250)).toEqual([-8, -37]);
    expect(hole('M6', 315.001)).toEqual([-10, -46]);
    expect(hole('M7', 300)).toEqual([0, -52]);
  });

  it.each([
    // [M] ISO 286-2 tables from memory; each is the ISO 286-1 rule applied to [C] deviations and IT values
    ['P7', 25, [-14, -35]],
    ['P7', 10, [-9, -24]],
    ['P9', 25, [-22, -74]],
    ['R7', 25, [-20, -41]],
    ['S7', 50, [-34, -59]],
    ['S7', 100, [-58, -93]],
    ['S6', 100, [-64, -86]],
    ['N7', 25, [-7, -28]],
    ['K7', 25, [6, -15]],
    ['K8', 12, [8, -19]],
    ['K3', 5, [0, -2.5]],
    ['K4', 5, [0.5, -3.5]],
    ['N9', 10, [0, -36]],
    ['N9', 2, [-4, -29]],
    ['M9', 50, [-9, -71]],
    ['K9', 2, [0, -25]],
    ['P6', 2, [-6, -12]],
    ['U7', 600, [-660, -730]],
    ['N7', 1000, [-56, -146]],
    ['K7', 1000, [0, -90]],
    ['ZC8', 10, [-97, -119]],
    ['J7', 25, [12, -9]],
    ['J6', 2, [2, -4]],
    ['J8', 450, [66, -31]],
    ['CD8', 5, [64, 46]],
    ['EF7', 8, [33, 18]],
    ['FG6', 2, [10, 4]],
  ] as const)('%s at %s mm [M]', (designation, size, expected) => {
    expect(hole(designation, size)).toEqual(expected);
  });

  it('makes JS symmetric with the even rule for grades 7–11 [C: Machine Drawing Table 15.2 footnote]', () => {
    expect(hole('JS7', 25)).toEqual([10, -10]);
    expect(hole('JS6', 25)).toEqual([6.5, -6.5]);
    expect(hole('JS8', 15)).toEqual([13, -13]);
  });

  it.each([
    ['K9', 10, /K above IT8 only up to 3 mm/],
    ['K9', 600, /K above IT8 only up to 3 mm/],
    ['N9', 1, /N above IT8 for nominal sizes up to 1 mm/],
    ['K2', 10, /Δ only for IT3 to IT8/],
    ['P1', 25, /Δ only for IT3 to IT8/],
    ['J9', 25, /J only as J6, J7 and J8/],
    ['J7', 600, /up to 500 mm/],
    ['A11', 1, /A are not used/],
    ['C11', 630, /C only up to 500 mm/],
    ['CD8', 12, /CD only up to 10 mm/],
    ['T7', 20, /T only over 24 mm/],
    ['V7', 12, /V only over 14 mm up to 500 mm/],
    ['ZA7', 600, /ZA only up to 500 mm/],
    ['H15', 0.5, /IT14 to IT18/],
    ['H0', 501, /IT0 only up to 500 mm/],
  ] as const)('refuses %s at %s mm as not defined', (designation, size, message) => {
    expect(hole(designation, size)).toMatch(message);
  });

  it('applies Δ only up to 500 mm: above it K–U mirror the shaft exactly [C rule: ISO 286-1 Table 3 gives Δ to 500 mm]', () => {
    expect(hole('N7', 500)).toEqual([-40 + 23, -40 + 23 - 63]);
    expect(hole('N7', 500.001)).toEqual([-44, -114]);
  });
});
