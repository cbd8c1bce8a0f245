import { describe, expect, it } from 'vitest';
import { markedToRanges } from './highlights.js';

const s = '\uE000';
const e = '\uE001';

describe('markedToRanges', () => {
  it('strips the markers and reports the ranges they enclosed', () => {
    const { text, ranges } = markedToRanges(`The minimum ${s}wall${e} between a ${s}port${e} and the bore`);
    expect(text).toBe('The minimum wall between a port and the bore');
    expect(ranges.map((range) => text.slice(range.start, range.end))).toEqual(['wall', 'port']);
  });

  it('joins the words of a matched phrase and flattens line breaks', () => {
    const { text, ranges } = markedToRanges(`Purpose\n\n${s}Minimum${e} ${s}wall${e}\nrule`);
    expect(text).toBe('Purpose Minimum wall rule');
    expect(ranges).toEqual([{ start: 8, end: 20 }]);
  });

  it('counts offsets in UTF-16 code units, as the browser slices strings', () => {
    const { text, ranges } = markedToRanges(`Ø 20 — ${s}Ⓛ${e} 😀 ${s}bore${e}`);
    expect(ranges.map((range) => text.slice(range.start, range.end))).toEqual(['Ⓛ', 'bore']);
  });

  it('ignores stray or empty markers', () => {
    expect(markedToRanges(`${e}a ${s}${e} b ${s}`)).toEqual({ text: 'a b', ranges: [] });
  });
});
