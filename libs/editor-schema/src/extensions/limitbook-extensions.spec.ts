// @vitest-environment jsdom
import { Editor, type JSONContent } from '@tiptap/core';
import { afterEach, describe, expect, it } from 'vitest';
import { CalculatorBlock } from '../nodes/calculator-block.js';
import { everyNodeDocument, sampleBlockIds } from '../testing/index.js';
import { listCalculatorBlocks } from '../text/list-calculator-blocks.js';
import { validateDocument } from '../validation/validate-document.js';
import { limitbookExtensions } from './limitbook-extensions.js';

const editors: Editor[] = [];

function editorWith(content: JSONContent | string, extensions = limitbookExtensions()): Editor {
  const editor = new Editor({ extensions, content });
  editors.push(editor);
  return editor;
}

function validated(json: unknown) {
  const result = validateDocument(json);
  if (!result.ok) throw new Error(JSON.stringify(result.errors, null, 2));
  return result.doc;
}

afterEach(() => {
  while (editors.length > 0) editors.pop()!.destroy();
});

describe('limitbookExtensions in a real editor', () => {
  it('produces JSON the server accepts, for a page using every node and mark', () => {
    const editor = editorWith(everyNodeDocument());
    expect(validated(editor.getJSON())).toEqual(validated(everyNodeDocument()));
  });

  it('reads back its own HTML unchanged, custom nodes included', () => {
    const html = editorWith(everyNodeDocument()).getHTML();
    expect(editorWith(html).getJSON()).toEqual(validated(everyNodeDocument()));
  });

  it('turns hostile pasted HTML into a page the server accepts', () => {
    const hostile = [
      '<p onclick="alert(1)">Hi <a href="javascript:alert(1)" onclick="alert(1)">js</a> <a href=" JaVaScRiPt:alert(1)">js2</a>',
      '<a href="https://example.com" target="_top" class="x" rel="opener">ok</a></p>',
      '<img src="x" onerror="alert(1)"><img src="data:image/svg+xml,<svg onload=alert(1)>">',
      '<img src="https://example.com/a.png" width="abc" onerror="alert(1)">',
      '<script>alert(1)</script><iframe src="https://example.com"></iframe><style>p{}</style>',
      '<div data-type="calculator-block" data-method="wall-between-features" data-block-id="x" data-defaults="{oops" data-unit="cm" onclick="alert(1)"></div>',
      '<div data-type="calculator-block" data-caption="no method"></div>',
    ].join('');
    const editor = editorWith({ type: 'doc', content: [{ type: 'paragraph' }] });
    editor.commands.insertContent(hostile);
    const json = editor.getJSON();
    const text = JSON.stringify(json);
    expect(text).not.toMatch(/javascript|onerror|onclick|onload|data:|<script|iframe/i);
    const images = (json.content ?? []).filter((node) => node.type === 'image');
    expect(images).toEqual([{ type: 'image', attrs: { src: 'https://example.com/a.png', alt: null, title: null, width: null, height: null } }]);
    const links = JSON.stringify(json).match(/"href":"[^"]*"/g);
    expect(links).toEqual(['"href":"https://example.com"']);
    expect(text).toContain('"target":"_blank"');
    expect(text).toContain('"rel":"noopener noreferrer nofollow"');

    const [block] = listCalculatorBlocks(validated(json));
    expect(listCalculatorBlocks(json)).toHaveLength(1);
    expect(block).toMatchObject({ method: 'wall-between-features', unit: 'mm', defaults: {} });
    expect(block?.blockId).not.toBe('x');
  });

  it('refuses to set a javascript: link', () => {
    const editor = editorWith({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'click' }] }] });
    editor.commands.selectAll();
    expect(editor.commands.setLink({ href: 'javascript:alert(1)' })).toBe(false);
    expect(editor.commands.setLink({ href: '/pages/TH-DS-101' })).toBe(true);
    expect(JSON.stringify(editor.getJSON())).toContain('"href":"/pages/TH-DS-101"');
  });

  it('gives an inserted calculator block a fresh id, and a pasted copy another one', () => {
    const editor = editorWith({ type: 'doc', content: [{ type: 'paragraph' }] });
    editor.commands.insertCalculatorBlock({ method: 'wall-between-features', caption: 'Port wall' });
    const [inserted] = listCalculatorBlocks(validated(editor.getJSON()));
    expect(inserted?.blockId).toMatch(/^[0-9a-f-]{36}$/);

    editor.commands.insertContentAt(editor.state.doc.content.size, { type: 'calculatorBlock', attrs: { blockId: inserted!.blockId, method: 'wall-between-features' } });
    const blocks = listCalculatorBlocks(validated(editor.getJSON()));
    expect(blocks).toHaveLength(2);
    expect(blocks[0]?.blockId).toBe(inserted?.blockId);
    expect(blocks[1]?.blockId).not.toBe(inserted?.blockId);
  });

  it('keeps stored block ids as they are', () => {
    const editor = editorWith(everyNodeDocument());
    expect(listCalculatorBlocks(editor.getJSON()).map((block) => block.blockId)).toEqual([...sampleBlockIds]);
  });

  it('lets the web app replace a node with one that has a view, and refuses a misnamed one', () => {
    const withView = CalculatorBlock.extend({
      addNodeView:
        () =>
        ({ view }) => {
          const dom = view.dom.ownerDocument.createElement('section');
          dom.className = 'calculator-view';
          return { dom };
        },
    });
    const editor = editorWith(everyNodeDocument(), limitbookExtensions({ replace: { calculatorBlock: withView } }));
    expect(editor.view.dom.querySelectorAll('section.calculator-view')).toHaveLength(2);
    expect(validated(editor.getJSON())).toEqual(validated(everyNodeDocument()));
    expect(() => limitbookExtensions({ replace: { caution: withView } })).toThrow('The replacement for caution is named calculatorBlock');
  });
});
