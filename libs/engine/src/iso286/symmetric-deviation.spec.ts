import { describe, expect, it } from 'vitest';
import { symmetricHalfTolerance } from './symmetric-deviation.js';
import { type ToleranceClass } from './tolerance-class.js';

const js = (grade: ToleranceClass['grade']): ToleranceClass => ({ side: 'shaft', letter: 'js', grade, designation: `js${grade}` });

describe('symmetricHalfTolerance', () => {
  it('rounds an odd IT down to even for grades 7 to 11 only [C: Machine Drawing Table 15.2 footnote, js7 18–30 = ±10]', () => {
    expect(symmetricHalfTolerance(js('7'), 2100)).toEqual({ half: 1000, evenRounded: true });
    expect(symmetricHalfTolerance(js('11'), 7500)).toEqual({ half: 3700, evenRounded: true });
    expect(symmetricHalfTolerance(js('6'), 1300)).toEqual({ half: 650, evenRounded: false });
    expect(symmetricHalfTolerance(js('12'), 21000)).toEqual({ half: 10500, evenRounded: false });
    expect(symmetricHalfTolerance(js('8'), 2200)).toEqual({ half: 1100, evenRounded: false });
  });
});
