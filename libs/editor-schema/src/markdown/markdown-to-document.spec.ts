import { describe, expect, it } from 'vitest';
import { listCalculatorBlocks } from '../text/list-calculator-blocks.js';
import { validateDocument } from '../validation/validate-document.js';
import { MarkdownConversionError, markdownToDocument } from './markdown-to-document.js';

const blockId = '5b0e7a52-8c1d-4f3e-9a6b-2c4d8e1f0a37';

function converted(source: string) {
  const doc = markdownToDocument(source);
  const result = validateDocument(doc);
  if (!result.ok) throw new Error(JSON.stringify(result.errors, null, 2));
  return doc;
}

const sample = [
  '# Purpose',
  '',
  'Keep **enough wall** between a *cross-drilled* port and the ~~main~~ bore; see [the fits page](/pages/BW-STD-120) and `minWall`.',
  'A second line of the same paragraph, with $t = \\frac{D - d}{2}$ inline.',
  '',
  '## Rule',
  '',
  '1. Size the port.',
  '2. Check the wall:',
  '   - at LMC',
  '   - at LMB',
  '',
  '> Geometry only.',
  '',
  '$$',
  'W_{min} = \\frac{D_{LMC} - d_{LMC}}{2} - t',
  '$$',
  '',
  '| Port | Minimum wall |',
  '|:-----|-------------:|',
  '| P1   | 1.5 mm       |',
  '',
  '```caution',
  'level: warning',
  'A geometric wall check is **not** a pressure check.',
  '',
  '- Defer to the pressure code.',
  '```',
  '',
  '```calculator',
  JSON.stringify({ blockId, method: 'wall-thickness', unit: 'mm', defaults: { positionTolerance: 0.2 }, locked: ['positionTolerance'], acceptance: 'minWall >= 1.5 mm', caption: 'Port to bore wall' }),
  '```',
  '',
  '```text',
  'minWall >= 1.5 mm',
  '```',
  '',
  '---',
  '',
  '![Section A-A](https://example.com/section.png "Section")',
].join('\n');

describe('markdownToDocument', () => {
  const doc = converted(sample);
  const types = (doc.content ?? []).map((node) => node.type);

  it('turns every construct of a standards page into nodes the server accepts', () => {
    expect(types).toEqual([
      'heading',
      'paragraph',
      'heading',
      'orderedList',
      'blockquote',
      'blockMath',
      'table',
      'caution',
      'calculatorBlock',
      'codeBlock',
      'horizontalRule',
      'image',
    ]);
  });

  it('keeps marks in schema order, links, code and inline math', () => {
    const paragraph = doc.content![1]!;
    expect(paragraph.content).toContainEqual({ type: 'text', text: 'enough wall', marks: [{ type: 'bold' }] });
    expect(paragraph.content).toContainEqual({ type: 'text', text: 'main', marks: [{ type: 'strike' }] });
    expect(paragraph.content).toContainEqual({ type: 'text', text: 'the fits page', marks: [{ type: 'link', attrs: { href: '/pages/BW-STD-120' } }] });
    expect(paragraph.content).toContainEqual({ type: 'text', text: 'minWall', marks: [{ type: 'code' }] });
    expect(paragraph.content).toContainEqual({ type: 'inlineMath', attrs: { latex: 't = \\frac{D - d}{2}' } });
    expect(paragraph.content).toContainEqual({ type: 'text', text: '. A second line of the same paragraph, with ' });
  });

  it('nests lists and reads table alignment and header cells', () => {
    const list = doc.content![3]!;
    expect(list.attrs).toEqual({ start: 1 });
    expect(list.content![1]!.content!.map((node) => node.type)).toEqual(['paragraph', 'bulletList']);
    const [header, row] = doc.content![6]!.content!;
    expect(header!.content!.map((cell) => [cell.type, cell.attrs?.align])).toEqual([
      ['tableHeader', 'left'],
      ['tableHeader', 'right'],
    ]);
    expect(row!.content![1]).toEqual({ type: 'tableCell', attrs: { align: 'right' }, content: [{ type: 'paragraph', content: [{ type: 'text', text: '1.5 mm' }] }] });
  });

  it('reads caution levels and calculator blocks, with the acceptance rule parsed', () => {
    const caution = doc.content![7]!;
    expect(caution.attrs).toEqual({ level: 'warning' });
    expect(caution.content!.map((node) => node.type)).toEqual(['paragraph', 'bulletList']);
    expect(listCalculatorBlocks(doc)).toEqual([
      {
        blockId,
        method: 'wall-thickness',
        methodVersion: null,
        unit: 'mm',
        defaults: { positionTolerance: 0.2 },
        locked: ['positionTolerance'],
        acceptance: { output: 'minWall', operator: '>=', value: 1.5, unit: 'mm' },
        caption: 'Port to bore wall',
      },
    ]);
    expect(doc.content![9]).toEqual({ type: 'codeBlock', attrs: { language: 'text' }, content: [{ type: 'text', text: 'minWall >= 1.5 mm' }] });
  });

  it('lifts images out of paragraphs, since images are blocks', () => {
    const split = converted('Before ![Port](/api/files/c3d4e5f6-a7b8-4c9d-8e0f-1a2b3c4d5e6f) after');
    expect(split.content!.map((node) => node.type)).toEqual(['paragraph', 'image', 'paragraph']);
    expect(split.content![1]!.attrs).toEqual({ src: '/api/files/c3d4e5f6-a7b8-4c9d-8e0f-1a2b3c4d5e6f', alt: 'Port', title: null });
  });

  it('leaves prices and raw HTML as plain text', () => {
    const prices = converted('It costs $5 and $6 today. <script>alert(1)</script> <img src=x onerror=alert(1)>');
    expect(prices.content).toEqual([
      { type: 'paragraph', content: [{ type: 'text', text: 'It costs $5 and $6 today. <script>alert(1)</script> <img src=x onerror=alert(1)>' }] },
    ]);
  });

  it('gives an empty page one empty paragraph', () => {
    expect(converted('')).toEqual({ type: 'doc', content: [{ type: 'paragraph' }] });
  });

  it('refuses what a page cannot hold, naming the line', () => {
    const calculator = (body: string) => ['Intro', '', '```calculator', body, '```'].join('\n');
    expect(() => markdownToDocument(calculator('{ not json'))).toThrow(/line 3: Calculator block is not valid JSON/);
    expect(() => markdownToDocument(calculator(JSON.stringify({ blockId, method: 'x', acceptance: 'minWall is big' })))).toThrow(
      /line 3: Acceptance rule "minWall is big"/,
    );
    expect(() => markdownToDocument('```caution\nlevel: danger\nText\n```')).toThrow(/Caution level must be one of/);
    expect(() => markdownToDocument('```caution\n# Heading\n```')).toThrow(/holds paragraphs and lists only, not heading/);
    expect(() => markdownToDocument('a\n\nb [x](ftp://example.com/file)')).toThrow(MarkdownConversionError);
    expect(() => markdownToDocument('# A ![x](https://example.com/x.png)')).toThrow(/Images cannot stand in headings/);
    expect(() => markdownToDocument('x', { lineOffset: 6 })).not.toThrow();
    expect(() => markdownToDocument('```calculator\n[]\n```', { lineOffset: 6 })).toThrow(/^line 7: /);
  });

  it('leaves attribute checks to validateDocument, which names the path', () => {
    const doc = markdownToDocument(['```calculator', JSON.stringify({ blockId, method: 'wall-thickness', locked: ['positionTolerance'] }), '```'].join('\n'));
    const result = validateDocument(doc);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toEqual([{ path: 'content.0.attrs.locked.0', message: 'Locked input positionTolerance has no default value' }]);
  });
});
