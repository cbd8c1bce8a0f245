import { describe, expect, it } from 'vitest';
import { everyNodeDocument, sampleBlockIds } from '../testing/index.js';
import { limitbookSchema, type LimitbookDocument } from './limitbook-schema.js';
import { documentLimits, validateDocument, type DocumentError } from './validate-document.js';

type Json = Record<string, unknown>;

const paragraph = (text: string): Json => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const doc = (...content: Json[]): Json => ({ type: 'doc', content });
const calculatorBlock = (attrs: Json): Json => ({
  type: 'calculatorBlock',
  attrs: { blockId: crypto.randomUUID(), method: 'wall-between-features', ...attrs },
});
const linked = (href: string): Json =>
  doc({ type: 'paragraph', content: [{ type: 'text', text: 'see', marks: [{ type: 'link', attrs: { href } }] }] });

function errorsOf(json: unknown): DocumentError[] {
  const result = validateDocument(json);
  if (result.ok) throw new Error('expected the document to be refused');
  return result.errors;
}

function collectTypes(node: LimitbookDocument, nodes = new Set<string>(), marks = new Set<string>()) {
  if (node.type) nodes.add(node.type);
  for (const mark of node.marks ?? []) marks.add(mark.type);
  for (const child of node.content ?? []) collectTypes(child as LimitbookDocument, nodes, marks);
  return { nodes, marks };
}

describe('validateDocument accepts', () => {
  it('a document using every node and mark of the schema', () => {
    const sample = everyNodeDocument();
    const used = collectTypes(sample);
    const schema = limitbookSchema();
    expect([...used.nodes].sort()).toEqual(Object.keys(schema.nodes).sort());
    expect([...used.marks].sort()).toEqual(Object.keys(schema.marks).sort());

    const result = validateDocument(sample);
    expect(result).toMatchObject({ ok: true });
  });

  it('returns the document with defaults filled in, which validates again unchanged', () => {
    const result = validateDocument(doc({ type: 'heading', content: [{ type: 'text', text: 'Scope' }] }, calculatorBlock({ blockId: sampleBlockIds[0] })));
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.doc.content?.[0]).toEqual({ type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Scope' }] });
    expect(result.doc.content?.[1]?.attrs).toEqual({
      blockId: sampleBlockIds[0],
      method: 'wall-between-features',
      methodVersion: null,
      unit: 'mm',
      defaults: {},
      locked: [],
      acceptance: null,
      caption: '',
    });
    expect(validateDocument(result.doc)).toEqual(result);
  });

  it('markup typed as text, which stays text', () => {
    expect(validateDocument(doc(paragraph('<script>alert(1)</script><img src=x onerror=alert(1)>'))).ok).toBe(true);
  });
});

describe('validateDocument refuses', () => {
  it('a root that is not a doc, and what is not a document at all', () => {
    expect(errorsOf(paragraph('x'))).toEqual([{ path: 'type', message: 'The root node must be a doc' }]);
    expect(errorsOf('<p>x</p>')).toEqual([{ path: '', message: 'A node must be an object' }]);
    expect(errorsOf(null)).toEqual([{ path: '', message: 'A node must be an object' }]);
  });

  it('a script node', () => {
    expect(errorsOf(doc(paragraph('a'), { type: 'script', content: [{ type: 'text', text: 'alert(1)' }] }))).toEqual([
      { path: 'content.1.type', message: 'Unknown node type script' },
    ]);
  });

  it('an iframe, deep inside a table', () => {
    const table = {
      type: 'table',
      content: [{ type: 'tableRow', content: [{ type: 'tableCell', content: [{ type: 'iframe', attrs: { src: 'https://example.com' } }] }] }],
    };
    expect(errorsOf(doc(table))).toEqual([{ path: 'content.0.content.0.content.0.content.0.type', message: 'Unknown node type iframe' }]);
  });

  it('a raw HTML field on a node', () => {
    expect(errorsOf(doc({ type: 'paragraph', html: '<b>x</b>' }))).toEqual([{ path: 'content.0.html', message: 'Unknown field html on a node' }]);
  });

  it('an unknown mark', () => {
    expect(errorsOf(doc({ type: 'paragraph', content: [{ type: 'text', text: 'x', marks: [{ type: 'bold' }, { type: 'highlight' }] }] }))).toEqual([
      { path: 'content.0.content.0.marks.1.type', message: 'Unknown mark type highlight' },
    ]);
  });

  it.each([
    ['image', { type: 'image', attrs: { src: 'https://example.com/a.png', onerror: 'alert(1)' } }, 'content.0.attrs.onerror'],
    ['paragraph', { type: 'paragraph', attrs: { onclick: 'alert(1)' }, content: [{ type: 'text', text: 'x' }] }, 'content.0.attrs.onclick'],
    ['heading', { type: 'heading', attrs: { level: 2, style: 'color:red' }, content: [{ type: 'text', text: 'x' }] }, 'content.0.attrs.style'],
  ])('an event handler or unknown attribute on %s', (type, node, path) => {
    expect(errorsOf(doc(node))).toEqual([{ path, message: `Unknown attribute ${path.split('.').pop()} on ${type}` }]);
  });

  it('an event handler on a link', () => {
    const link = { type: 'link', attrs: { href: 'https://example.com', onclick: 'alert(1)' } };
    expect(errorsOf(doc({ type: 'paragraph', content: [{ type: 'text', text: 'x', marks: [link] }] }))).toEqual([
      { path: 'content.0.content.0.marks.0.attrs.onclick', message: 'Unknown attribute onclick on link' },
    ]);
  });

  it.each(['javascript:alert(1)', ' JaVaScRiPt:alert(1)', 'java\tscript:alert(1)', '&#106;avascript:alert(1)', 'data:text/html,<script>alert(1)</script>', 'vbscript:msgbox(1)'])(
    'the link %j',
    (href) => {
      expect(errorsOf(linked(href))).toEqual([
        { path: 'content.0.content.0.marks.0.attrs.href', message: 'Link must be an http(s) or mailto address or a path on this site' },
      ]);
    },
  );

  it.each(['data:text/html;base64,PHNjcmlwdD4=', 'data:image/svg+xml,<svg onload=alert(1)>', 'javascript:alert(1)'])('the image source %j', (src) => {
    expect(errorsOf(doc({ type: 'image', attrs: { src } }))).toEqual([
      { path: 'content.0.attrs.src', message: 'Image must be an uploaded file (/api/files/…) or an http(s) address' },
    ]);
  });

  it('a calculator block with an unknown attribute', () => {
    expect(errorsOf(doc(calculatorBlock({ script: 'alert(1)' })))).toEqual([
      { path: 'content.0.attrs.script', message: 'Unknown attribute script on calculatorBlock' },
    ]);
  });

  it('a calculator block whose locked inputs are not a list', () => {
    expect(errorsOf(doc(calculatorBlock({ defaults: { bore: 20 }, locked: 'bore' })))).toEqual([
      { path: 'content.0.attrs.locked', message: 'Locked inputs must be a list of input paths' },
    ]);
  });

  it('a calculator block locking an input without a default', () => {
    expect(errorsOf(doc(calculatorBlock({ defaults: { bore: 20 }, locked: ['bore', 'port.diameter'] })))).toEqual([
      { path: 'content.0.attrs.locked.1', message: 'Locked input port.diameter has no default value' },
    ]);
  });

  it('a calculator block with an unknown operator', () => {
    const errors = errorsOf(doc(calculatorBlock({ acceptance: { output: 'minWall', operator: '=>', value: 1.5 } })));
    expect(errors).toEqual([{ path: 'content.0.attrs.acceptance.operator', message: 'Operator must be one of >=, <=, >, <, ==, between' }]);
  });

  it('a calculator block with a malformed id, unit or version', () => {
    const errors = errorsOf(doc(calculatorBlock({ blockId: 'block-1', unit: 'cm', methodVersion: 1.5, caption: 'x'.repeat(501) })));
    expect(errors.map((error) => error.path)).toEqual(['content.0.attrs.blockId', 'content.0.attrs.methodVersion', 'content.0.attrs.unit', 'content.0.attrs.caption']);
  });

  it('duplicate block ids', () => {
    const blockId = sampleBlockIds[0];
    const table = { type: 'table', content: [{ type: 'tableRow', content: [{ type: 'tableCell', content: [calculatorBlock({ blockId })] }] }] };
    expect(errorsOf(doc(calculatorBlock({ blockId }), table))).toEqual([
      { path: 'content.1.content.0.content.0.content.0.attrs.blockId', message: `Block id ${blockId} is already used at content.0` },
    ]);
  });

  it(`more than ${documentLimits.maxCalculatorBlocks} calculator blocks`, () => {
    const blocks = Array.from({ length: documentLimits.maxCalculatorBlocks + 1 }, () => calculatorBlock({}));
    expect(errorsOf(doc(...blocks))).toEqual([
      { path: `content.${documentLimits.maxCalculatorBlocks}`, message: `A page holds at most ${documentLimits.maxCalculatorBlocks} calculator blocks` },
    ]);
  });

  it('an oversize document', () => {
    const big = doc(...Array.from({ length: 50 }, () => paragraph('x'.repeat(50_000))));
    expect(errorsOf(big)).toEqual([{ path: '', message: 'Document is larger than 2 MB' }]);
  });

  it('too many nodes', () => {
    const many = doc(...Array.from({ length: documentLimits.maxNodes }, () => paragraph('x')));
    expect(errorsOf(many)).toEqual([{ path: '', message: `Document has more than ${documentLimits.maxNodes} nodes` }]);
  });

  it('nesting deeper than the limit', () => {
    let node: Json = paragraph('deep');
    for (let level = 0; level < documentLimits.maxDepth; level++) node = { type: 'blockquote', content: [node] };
    const errors = errorsOf(doc(node));
    expect(errors).toHaveLength(1);
    expect(errors[0]?.message).toBe(`Nodes are nested deeper than ${documentLimits.maxDepth} levels`);
    expect(errors[0]?.path).toBe(Array.from({ length: documentLimits.maxDepth + 1 }, () => 'content.0').join('.'));
  });

  it('hostile nesting far beyond the limit without overflowing the stack', () => {
    let node: Json = paragraph('deep');
    for (let level = 0; level < 100_000; level++) node = { type: 'blockquote', content: [node] };
    expect(errorsOf(doc(node))).toEqual([{ path: '', message: `Document is nested deeper than ${documentLimits.maxDepth} levels` }]);
  });

  it('a cyclic object, without hanging', () => {
    const node: Json = { type: 'blockquote', content: [] };
    (node.content as Json[]).push(node);
    expect(errorsOf(doc(node))).toEqual([{ path: '', message: `Document is nested deeper than ${documentLimits.maxDepth} levels` }]);
  });

  it('content the schema does not allow, with its path', () => {
    const listItemWithHeading = { type: 'bulletList', content: [{ type: 'listItem', content: [{ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'x' }] }] }] };
    expect(errorsOf(doc(paragraph('a'), listItemWithHeading))).toEqual([{ path: 'content.1.content.0', message: 'A listItem cannot hold heading' }]);
    expect(errorsOf(doc({ type: 'caution', content: [] }))).toEqual([{ path: 'content.0', message: 'A caution cannot be empty' }]);
    expect(errorsOf(doc({ type: 'caution', content: [{ type: 'heading', content: [{ type: 'text', text: 'x' }] }] }))).toEqual([
      { path: 'content.0', message: 'A caution cannot hold heading' },
    ]);
  });

  it('marks where the schema allows none, and text with no text', () => {
    const boldCode = { type: 'codeBlock', content: [{ type: 'text', text: 'x', marks: [{ type: 'bold' }] }] };
    expect(errorsOf(doc(boldCode))).toEqual([{ path: 'content.0.content.0.marks', message: 'A codeBlock does not allow bold' }]);
    expect(errorsOf(doc({ type: 'paragraph', content: [{ type: 'text', text: '' }] }))).toEqual([
      { path: 'content.0.content.0.text', message: 'A text node needs non-empty text' },
    ]);
  });

  it('heading levels the editor does not offer', () => {
    expect(errorsOf(doc({ type: 'heading', attrs: { level: 6 }, content: [{ type: 'text', text: 'x' }] }))).toEqual([
      { path: 'content.0.attrs.level', message: 'Heading level must be 1, 2, 3, 4' },
    ]);
  });

  it('prototype keys as types or attributes', () => {
    expect(errorsOf(doc({ type: 'constructor' }))).toEqual([{ path: 'content.0.type', message: 'Unknown node type constructor' }]);
    expect(errorsOf(JSON.parse('{"type":"doc","content":[{"type":"paragraph","attrs":{"__proto__":{"x":1}}}]}'))).toEqual([
      { path: 'content.0.attrs.__proto__', message: 'Unknown attribute __proto__ on paragraph' },
    ]);
  });
});
