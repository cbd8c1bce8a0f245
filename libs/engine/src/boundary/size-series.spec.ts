import { describe, expect, it } from 'vitest';
import { sizeSeries } from './size-series.js';

describe('sizeSeries', () => {
  it('covers a 0.2 mm range in 0.02 mm steps, both limits included', () => {
    expect(sizeSeries(10, 10.2, 'mm')).toEqual([10, 10.02, 10.04, 10.06, 10.08, 10.1, 10.12, 10.14, 10.16, 10.18, 10.2]);
  });

  it('runs downwards and ends on the limit when the range is not a whole number of steps', () => {
    expect(sizeSeries(10.13, 10, 'mm')).toEqual([10.13, 10.11, 10.09, 10.07, 10.05, 10.03, 10.01, 10]);
  });

  it('uses round inch steps', () => {
    expect(sizeSeries(0.073, 0.077, 'in')).toEqual([0.073, 0.0735, 0.074, 0.0745, 0.075, 0.0755, 0.076, 0.0765, 0.077]);
  });

  it('gives one size when the limits are equal', () => {
    expect(sizeSeries(12, 12, 'mm')).toEqual([12]);
  });

  it('never steps finer than the display resolution', () => {
    expect(sizeSeries(5, 5.0003, 'mm')).toEqual([5, 5.0001, 5.0002, 5.0003]);
  });
});
