import type { LimitbookDocument } from '../validation/limitbook-schema.js';

export const sampleBlockIds = ['6f1c2b9e-3d4a-4b5c-8d6e-7f8091a2b3c4', '0a9b8c7d-6e5f-4a3b-9c2d-1e0f2a3b4c5d'] as const;
export const sampleFileId = 'c3d4e5f6-a7b8-4c9d-8e0f-1a2b3c4d5e6f';

const text = (value: string, marks?: LimitbookDocument['marks']) => ({ type: 'text', text: value, ...(marks ? { marks } : {}) });
const paragraph = (...content: object[]) => ({ type: 'paragraph', content });

/**
 * A page body that uses every node and mark of the editor with typical attributes, for
 * tests that must accept everything the editor can produce.
 */
export function everyNodeDocument(): LimitbookDocument {
  return {
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 1 }, content: [text('TH-DS-204 Cross-drilled ports near a bore')] },
      { type: 'heading', attrs: { level: 4 }, content: [text('Purpose')] },
      paragraph(
        text('Minimum wall is '),
        text('checked', [{ type: 'bold' }]),
        text(' at '),
        text('LMC', [{ type: 'italic' }, { type: 'underline' }]),
        text(' — not '),
        text('assumed', [{ type: 'strike' }]),
        text('; see '),
        text('ASME Y14.5', [{ type: 'link', attrs: { href: 'https://www.asme.org/', target: '_blank', rel: 'noopener noreferrer nofollow', title: null } }]),
        text(', '),
        text('TH-DS-101', [{ type: 'link', attrs: { href: '/pages/TH-DS-101' } }]),
        text(' or '),
        text('the standards office', [{ type: 'link', attrs: { href: 'mailto:standards@example.com' } }]),
        { type: 'hardBreak' },
        text('Evaluate with '),
        text('minWall', [{ type: 'code' }]),
        text(' where '),
        { type: 'inlineMath', attrs: { latex: 't_{min} = \\tfrac{D_{LMC} - d_{LMC}}{2} - \\tfrac{t_{pos}}{2}' } },
        text('.'),
      ),
      { type: 'blockMath', attrs: { latex: 'W_{min} = \\frac{D_{LMC}}{2} - \\frac{d_{LMC}}{2} - t' } },
      {
        type: 'bulletList',
        content: [
          { type: 'listItem', content: [paragraph(text('Bore per TH-DS-110.'))] },
          {
            type: 'listItem',
            content: [paragraph(text('Ports:')), { type: 'orderedList', attrs: { start: 1, type: null }, content: [{ type: 'listItem', content: [paragraph(text('P1'))] }] }],
          },
        ],
      },
      { type: 'orderedList', attrs: { start: 3 }, content: [{ type: 'listItem', content: [paragraph(text('Third step'))] }] },
      { type: 'blockquote', content: [paragraph(text('A wall is not a pressure rating.'))] },
      { type: 'codeBlock', attrs: { language: 'text' }, content: [text('minWall >= 1.5 mm')] },
      { type: 'horizontalRule' },
      {
        type: 'table',
        content: [
          {
            type: 'tableRow',
            content: [
              { type: 'tableHeader', attrs: { colspan: 1, rowspan: 1, colwidth: [120], align: 'left' }, content: [paragraph(text('Port'))] },
              { type: 'tableHeader', attrs: { colspan: 1, rowspan: 1, colwidth: null, align: null }, content: [paragraph(text('Minimum wall'))] },
            ],
          },
          {
            type: 'tableRow',
            content: [
              { type: 'tableCell', content: [paragraph(text('P1'))] },
              { type: 'tableCell', attrs: { align: 'right' }, content: [paragraph(text('1.5 mm'))] },
            ],
          },
        ],
      },
      { type: 'image', attrs: { src: `/api/files/${sampleFileId}`, alt: 'Section A–A through port P1', title: 'Section A–A', width: 640, height: null } },
      { type: 'image', attrs: { src: 'https://example.com/figure.png', alt: null, title: null } },
      { type: 'attachment', attrs: { fileId: sampleFileId, name: 'port-wall-study.pdf', size: 48_213, contentType: 'application/pdf' } },
      {
        type: 'caution',
        attrs: { level: 'warning' },
        content: [
          paragraph(text('Wall thickness is a geometric check, not a pressure rating.')),
          { type: 'bulletList', content: [{ type: 'listItem', content: [paragraph(text('Defer to the applicable pressure code.'))] }] },
        ],
      },
      {
        type: 'calculatorBlock',
        attrs: {
          blockId: sampleBlockIds[0],
          method: 'wall-between-features',
          methodVersion: 2,
          unit: 'mm',
          defaults: { bore: { diameter: 20, tolerance: 0.05 }, port: { diameter: 6 }, contributors: [{ tolerance: 0.1 }] },
          locked: ['bore.diameter', 'contributors.0.tolerance'],
          acceptance: { output: 'minWall', operator: '>=', value: 1.5, unit: 'mm' },
          caption: 'Port P1 to main bore wall',
        },
      },
      {
        type: 'calculatorBlock',
        attrs: {
          blockId: sampleBlockIds[1],
          method: 'shaft-end-play',
          methodVersion: null,
          unit: 'in',
          defaults: {},
          locked: [],
          acceptance: { output: 'gap', operator: 'between', value: 0.002, value2: 0.01 },
          caption: 'Shaft end play',
        },
      },
      { type: 'caution', attrs: { level: 'note' }, content: [paragraph(text('Sizes are in millimetres unless stated.'))] },
      { type: 'caution', content: [{ type: 'orderedList', content: [{ type: 'listItem', content: [paragraph(text('Check the mating part.'))] }] }] },
    ],
  };
}
