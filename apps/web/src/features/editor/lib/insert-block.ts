import { NodeSelection } from '@tiptap/pm/state';
import type { Editor, JSONContent } from '@tiptap/core';

/**
 * Inserts content at the cursor; with a block selected (a calculator, an image…) it goes
 * after that block instead of replacing it, so a toolbar click never deletes a block.
 */
export function insertBesideSelection(editor: Editor, content: JSONContent): boolean {
  const { selection } = editor.state;
  if (selection instanceof NodeSelection) return editor.chain().focus().insertContentAt(selection.to, content).run();
  return editor.chain().focus().insertContent(content).run();
}
