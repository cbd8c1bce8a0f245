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

  it('keeps the LaTeX source of inline and block math, set apart by spaces, so formulas are searchable', () => {
    expect(lines).toContain('W_{min} = \\frac{D_{LMC}}{2} - \\frac{d_{LMC}}{2} - t');
    expect(lines).toContain('Evaluate with minWall where t_{min} = \\tfrac{D_{LMC} - d_{LMC}}{2} - \\tfrac{t_{pos}}{2} .');
  });

  it('does not glue inline math to the words around it', () => {
    const paragraph = { type: 'paragraph', content: [{ type: 'text', text: 'a gap of' }, { type: 'inlineMath', attrs: { latex: 'G_{min}' } }, { type: 'text', text: 'between' }] };
    expect(extractText({ type: 'doc', content: [paragraph] })).toBe('a gap of G_{min} between');
  });

  it('leaves math out when asked', () => {
    const withoutMath = extractText(everyNodeDocument(), { includeMath: false });
    expect(withoutMath).not.toContain('\\frac');
    expect(withoutMath.split('\n')).toContain('Evaluate with minWall where .');
  });

  it('returns nothing for an empty page', () => {
    expect(extractText({ type: 'doc', content: [{ type: 'paragraph' }] })).toBe('');
  });
});
