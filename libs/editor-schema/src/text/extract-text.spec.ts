import { describe, expect, it } from 'vitest';
import { everyNodeDocument } from '../testing/index.js';
import { extractText } from './extract-text.js';

describe('extractText', () => {
  const text = extractText(everyNodeDocument());
  const lines = text.split('\n');

  it('gives one line per block, headings and paragraphs included', () => {
    expect(lines[0]).toBe('TH-DS-204 Cross-drilled ports near a bore');
    expect(lines).toContain('Purpose');
    expect(lines).toContain('Minimum wall is checked at LMC — not assumed; see ASME Y14.5, TH-DS-101 or the standards office');
    expect(lines).toContain('Evaluate with minWall where .');
  });

  it('picks up lists, quotes, code, table cells and cautions', () => {
    for (const line of ['Bore per TH-DS-110.', 'P1', 'A wall is not a pressure rating.', 'minWall >= 1.5 mm', 'Port', 'Minimum wall', '1.5 mm', 'Defer to the applicable pressure code.']) {
      expect(lines).toContain(line);
    }
  });

  it('picks up calculator captions, image alt texts and attachment names', () => {
    expect(lines).toContain('Port P1 to main bore wall');
    expect(lines).toContain('Shaft end play');
    expect(lines).toContain('Section A–A through port P1');
    expect(lines).toContain('port-wall-study.pdf');
  });

  it('leaves math out unless asked', () => {
    expect(text).not.toContain('\\frac');
    const withMath = extractText(everyNodeDocument(), { includeMath: true });
    expect(withMath).toContain('W_{min} = \\frac{D_{LMC}}{2} - \\frac{d_{LMC}}{2} - t');
    expect(withMath).toContain('Evaluate with minWall where t_{min}');
  });

  it('returns nothing for an empty page', () => {
    expect(extractText({ type: 'doc', content: [{ type: 'paragraph' }] })).toBe('');
  });
});
