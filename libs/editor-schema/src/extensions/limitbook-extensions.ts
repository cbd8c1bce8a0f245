import type { AnyExtension } from '@tiptap/core';
import { StarterKit } from '@tiptap/starter-kit';
import { Table, TableCell, TableHeader, TableRow } from '@tiptap/extension-table';
import { Attachment } from '../nodes/attachment.js';
import { CalculatorBlock } from '../nodes/calculator-block.js';
import { Caution } from '../nodes/caution.js';
import { BlockMath, InlineMath } from '../nodes/math.js';
import { LimitbookImage } from './image.js';
import { LimitbookLink } from './link.js';

export const headingLevels = [1, 2, 3, 4] as const;

/** Extensions whose node or mark the web app may replace, e.g. to add a node view. */
export type ReplaceableExtensionName =
  | 'link'
  | 'image'
  | 'table'
  | 'tableRow'
  | 'tableHeader'
  | 'tableCell'
  | 'attachment'
  | 'inlineMath'
  | 'blockMath'
  | 'caution'
  | 'calculatorBlock';

export interface LimitbookExtensionsOptions {
  /**
   * Replacements keyed by extension name, each built from the exported spec so the schema
   * stays the same: `{ calculatorBlock: CalculatorBlock.extend({ addNodeView }) }`.
   */
  replace?: Partial<Record<ReplaceableExtensionName, AnyExtension>>;
}

/**
 * The Tiptap extensions of Limitbook's page editor, without views: the server builds its
 * schema from this list and the web app builds its editor from it.
 */
export function limitbookExtensions(options: LimitbookExtensionsOptions = {}): AnyExtension[] {
  const own: Record<ReplaceableExtensionName, AnyExtension> = {
    link: LimitbookLink,
    image: LimitbookImage,
    table: Table.configure({ resizable: false }),
    tableRow: TableRow,
    tableHeader: TableHeader,
    tableCell: TableCell,
    attachment: Attachment,
    inlineMath: InlineMath,
    blockMath: BlockMath,
    caution: Caution,
    calculatorBlock: CalculatorBlock,
  };
  for (const [name, extension] of Object.entries(options.replace ?? {})) {
    if (!(name in own)) throw new Error(`There is no extension named ${name} to replace`);
    if (extension.name !== name) throw new Error(`The replacement for ${name} is named ${extension.name}`);
    own[name as ReplaceableExtensionName] = extension;
  }
  return [
    StarterKit.configure({
      link: false,
      heading: { levels: [...headingLevels] },
    }),
    ...Object.values(own),
  ];
}
