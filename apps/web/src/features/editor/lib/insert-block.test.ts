import { limitbookExtensions, listCalculatorBlocks, validateDocument } from '@limitbook/editor-schema';
import { Editor } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { insertBesideSelection } from './insert-block';

describe('insertBesideSelection', () => {
  it('puts a new calculator after a selected one instead of replacing it', () => {
    const editor = new Editor({
      extensions: limitbookExtensions(),
      content: {
        type: 'doc',
        content: [
          { type: 'paragraph', content: [{ type: 'text', text: 'Intro' }] },
          { type: 'calculatorBlock', attrs: { blockId: '6f1c2b9e-3d4a-4b5c-8d6e-7f8091a2b3c4', method: 'wall-thickness', caption: 'Port wall' } },
        ],
      },
    });
    editor.commands.setNodeSelection(7);
    insertBesideSelection(editor, { type: 'calculatorBlock', attrs: { method: 'iso286-fit' } });
    const blocks = listCalculatorBlocks(editor.getJSON());
    expect(blocks.map((block) => block.method)).toEqual(['wall-thickness', 'iso286-fit']);
    expect(blocks[1]?.blockId).toMatch(/^[0-9a-f-]{36}$/);
    expect(validateDocument(editor.getJSON()).ok).toBe(true);
    editor.destroy();
  });
});
