import { describe, expect, it } from 'vitest';
import { gradeNames, standardToleranceRows, type GradeName } from './tables/standard-tolerance-grades.js';
import { standardTolerance } from './standard-tolerance.js';

const it286 = (grade: GradeName, size: number) => {
  const value = standardTolerance(grade, size)?.value;
  return value === undefined ? undefined : value / 100;
};

describe('standardTolerance', () => {
  // [C] ISO 286-1 Table 1 as reproduced in IS 919-1 / Machinery's Handbook 31st ed.; three reproductions agree (team reference sheet §1).
  const confirmed: [number, number[]][] = [
    [2, [4, 6, 10, 14, 25, 40, 60]],
    [5, [5, 8, 12, 18, 30, 48, 75]],
    [10, [6, 9, 15, 22, 36, 58, 90]],
    [15, [8, 11, 18, 27, 43, 70, 110]],
    [25, [9, 13, 21, 33, 52, 84, 130]],
    [40, [11, 16, 25, 39, 62, 100, 160]],
    [60, [13, 19, 30, 46, 74, 120, 190]],
    [100, [15, 22, 35, 54, 87, 140, 220]],
    [150, [18, 25, 40, 63, 100, 160, 250]],
    [200, [20, 29, 46, 72, 115, 185, 290]],
    [300, [23, 32, 52, 81, 130, 210, 320]],
    [350, [25, 36, 57, 89, 140, 230, 360]],
    [450, [27, 40, 63, 97, 155, 250, 400]],
    [600, [32, 44, 70, 110, 175, 280, 440]],
    [3000, [96, 135, 210, 330, 540, 860, 1350]],
  ];
  it.each(confirmed)('IT5–IT11 at %s mm match ISO 286-1 Table 1 [C]', (size, values) => {
    expect((['5', '6', '7', '8', '9', '10', '11'] as const).map((grade) => it286(grade, size))).toEqual(values);
  });

  it('gives IT14 = 0.36 mm at 10 mm and 0.87 mm at 100 mm [C: ISO 286-1 Table 1 via team reference sheet §1]', () => {
    expect(it286('14', 10)).toBe(360);
    expect(it286('14', 100)).toBe(870);
  });

  it('uses the table, not the formula: IT7 at 10–18 is 18 µm though 16i computes 17.3 [C: reference sheet §1]', () => {
    expect(it286('7', 15)).toBe(18);
    expect(it286('11', 60)).toBe(190);
  });

  it('holds the fine and coarse grades [M: from memory of ISO 286-1 Table 1 and Annex A; matches two open-source reproductions]', () => {
    expect(it286('01', 2)).toBe(0.3);
    expect(it286('0', 2)).toBe(0.5);
    expect(it286('1', 2)).toBe(0.8);
    expect(it286('2', 5)).toBe(1.5);
    expect(it286('3', 5)).toBe(2.5);
    expect(it286('4', 40)).toBe(7);
    expect(it286('1', 150)).toBe(3.5);
    expect(it286('01', 450)).toBe(4);
    expect(it286('12', 25)).toBe(210);
    expect(it286('13', 25)).toBe(330);
    expect(it286('15', 100)).toBe(1400);
    expect(it286('16', 200)).toBe(2900);
    expect(it286('17', 5)).toBe(1200);
    expect(it286('18', 450)).toBe(9700);
    expect(it286('1', 600)).toBe(9);
    expect(it286('12', 600)).toBe(700);
    expect(it286('18', 3150)).toBe(33000);
    expect(it286('16', 1200)).toBe(6600);
  });

  it('has no IT01 or IT0 above 500 mm (ISO 286-1:2010 Annex A stops at 500 mm)', () => {
    expect(it286('01', 500)).toBe(4);
    expect(it286('01', 500.001)).toBeUndefined();
    expect(it286('0', 600)).toBeUndefined();
  });

  it('changes value exactly past each range bound [C values]', () => {
    expect(it286('7', 10)).toBe(15);
    expect(it286('7', 10.001)).toBe(18);
    expect(it286('7', 50)).toBe(25);
    expect(it286('7', 50.001)).toBe(30);
    expect(it286('7', 500)).toBe(63);
    expect(it286('7', 500.001)).toBe(70);
    expect(it286('7', 3150)).toBe(210);
    expect(it286('7', 3150.001)).toBeUndefined();
  });

  it('grows with grade and with size in every tabulated cell (a typo in the data would break this)', () => {
    for (const [index, row] of standardToleranceRows.entries()) {
      const values = row.slice(1).filter((value): value is number => value !== null);
      for (let grade = 1; grade < values.length; grade += 1) expect(values[grade]).toBeGreaterThan(values[grade - 1] as number);
      const next = standardToleranceRows[index + 1];
      if (next) {
        for (let column = 1; column < row.length; column += 1) {
          if (row[column] !== null && next[column] !== null) expect(next[column]).toBeGreaterThanOrEqual(row[column] as number);
        }
      }
    }
  });

  it('multiplies by 10 every five grades from IT6 on, as ISO 286-1 builds the series (IT11 = 10 × IT6 within rounding)', () => {
    for (const row of standardToleranceRows) {
      const it6 = row[1 + gradeNames.indexOf('6')] as number;
      const it11 = row[1 + gradeNames.indexOf('11')] as number;
      const it16 = row[1 + gradeNames.indexOf('16')] as number;
      expect(it11 / it6).toBeGreaterThan(9);
      expect(it11 / it6).toBeLessThan(11);
      expect(it16 / it11).toBeCloseTo(10, 0);
    }
  });
});
