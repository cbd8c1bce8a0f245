import { describe, expect, it } from 'vitest';
import { deltaGrades, deltaRows } from './tables/delta-values.js';
import { type gradeNames } from './tables/standard-tolerance-grades.js';
import { standardTolerance } from './standard-tolerance.js';

describe('Δ table (ISO 286-1 Table 3)', () => {
  it('is IT(n) − IT(n−1) of the same range in every cell above 3 mm [D: rule of ISO 286-1 applied to Table 1]', () => {
    for (const row of deltaRows.slice(1)) {
      const size = row[0];
      deltaGrades.forEach((grade, column) => {
        const current = standardTolerance(String(grade) as (typeof gradeNames)[number], size)?.value as number;
        const previous = standardTolerance(String(grade - 1) as (typeof gradeNames)[number], size)?.value as number;
        expect({ size, grade, delta: row[column + 1] }).toEqual({ size, grade, delta: (current - previous) / 100 });
      });
    }
  });

  it('is zero up to 3 mm [C: ISO 286-1 Table 3]', () => {
    expect(deltaRows[0]).toEqual([3, 0, 0, 0, 0, 0, 0]);
  });
});
