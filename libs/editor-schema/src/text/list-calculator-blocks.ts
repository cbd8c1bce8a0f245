import type { JSONContent } from '@tiptap/core';
import { calculatorBlockAttrsSchema, type CalculatorBlockAttrs } from '../calculator/calculator-block-attrs.js';

/**
 * The attributes of every calculator block in document order. Meant for documents that
 * passed `validateDocument`; throws on a block whose attributes are not valid.
 */
export function listCalculatorBlocks(doc: JSONContent): CalculatorBlockAttrs[] {
  const blocks: CalculatorBlockAttrs[] = [];
  const stack: JSONContent[] = [doc];
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (node.type === 'calculatorBlock') {
      const parsed = calculatorBlockAttrsSchema.safeParse(node.attrs ?? {});
      if (!parsed.success) throw new Error(`Calculator block ${blocks.length + 1} has invalid attributes: ${parsed.error.issues[0]?.message}`);
      blocks.push(parsed.data);
    }
    const children = node.content ?? [];
    for (let index = children.length - 1; index >= 0; index--) stack.push(children[index]!);
  }
  return blocks;
}
