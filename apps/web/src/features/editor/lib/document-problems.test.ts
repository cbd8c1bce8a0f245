import { limitbookExtensions } from '@limitbook/editor-schema';
import { Editor } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { describeDocumentProblems } from './document-problems';

describe('describeDocumentProblems', () => {
  it('names the block and attribute a server message is about, and where it sits in the editor', () => {
    const editor = new Editor({
      extensions: limitbookExtensions(),
      content: {
        type: 'doc',
        content: [
          { type: 'paragraph', content: [{ type: 'text', text: 'Intro' }] },
          { type: 'calculatorBlock', attrs: { blockId: '6f1c2b9e-3d4a-4b5c-8d6e-7f8091a2b3c4', method: '' } },
        ],
      },
    });
    const problems = describeDocumentProblems(editor.state.doc, {
      'document.content.1.attrs.method': 'Method id is required',
      title: 'Title is required',
    });
    expect(problems).toEqual([
      { field: 'document.content.1.attrs.method', message: 'Method id is required', where: 'Block 2 (calculator) › method', position: 7 },
    ]);
    expect(editor.state.doc.nodeAt(7)?.type.name).toBe('calculatorBlock');
    editor.destroy();
  });
});
