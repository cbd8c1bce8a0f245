import { describe, expect, it } from 'vitest';
import { shaftLowerDeviationRows, shaftUpperDeviationRows } from './tables/shaft-fundamental-deviations.js';
import { definedSpanText, lookupDeviationCell } from './lookup-deviation-cell.js';

describe('lookupDeviationCell', () => {
  it('reports the main range when the intermediate rows inside it agree, the intermediate step when they differ', () => {
    expect(lookupDeviationCell(shaftUpperDeviationRows, 4, 12)).toEqual({ value: -50, step: { over: 10, upTo: 18, index: 3 } });
    expect(lookupDeviationCell(shaftUpperDeviationRows, 0, 35)).toMatchObject({ value: -310, step: { over: 30, upTo: 40 } });
    expect(lookupDeviationCell(shaftLowerDeviationRows, 4, 70)).toMatchObject({ value: 43, step: { over: 65, upTo: 80 } });
  });

  it('returns a null cell where the standard has none, and nothing outside the table', () => {
    expect(lookupDeviationCell(shaftUpperDeviationRows, 2, 600)?.value).toBeNull();
    expect(lookupDeviationCell(shaftUpperDeviationRows, 2, 3151)).toBeUndefined();
  });

  it('describes where a column is defined', () => {
    expect(definedSpanText(shaftLowerDeviationRows, 6)).toBe('over 24 mm up to 3150 mm');
    expect(definedSpanText(shaftUpperDeviationRows, 3)).toBe('up to 10 mm');
  });
});
