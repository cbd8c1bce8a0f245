import type { Node as ProseMirrorNode } from '@tiptap/pm/model';

export type DocumentProblem = {
  /** The server's field key, e.g. `document.content.3.attrs.href`. */
  field: string;
  message: string;
  /** Where it is, in words: `Block 4 (calculator) › caption`. */
  where: string;
  /** Position of the offending node in the editor, to select it; null when it cannot be found. */
  position: number | null;
};

const nodeNames: Record<string, string> = {
  paragraph: 'paragraph',
  heading: 'heading',
  bulletList: 'bulleted list',
  orderedList: 'numbered list',
  listItem: 'item',
  blockquote: 'quotation',
  codeBlock: 'code block',
  table: 'table',
  tableRow: 'row',
  tableCell: 'cell',
  tableHeader: 'header cell',
  image: 'image',
  attachment: 'attached file',
  inlineMath: 'formula',
  blockMath: 'formula',
  caution: 'callout',
  calculatorBlock: 'calculator',
  text: 'text',
};

const attributeNames: Record<string, string> = {
  href: 'link address',
  src: 'image address',
  alt: 'image description',
  latex: 'LaTeX',
  method: 'method',
  defaults: 'default inputs',
  locked: 'locked inputs',
  acceptance: 'acceptance rule',
  caption: 'caption',
  unit: 'unit',
  level: 'level',
  fileId: 'file',
};

/**
 * Turns the server's field keys for a refused page body into messages an author can act on,
 * each pointing at the node in the editor it concerns.
 */
export function describeDocumentProblems(doc: ProseMirrorNode, fields: Record<string, string>): DocumentProblem[] {
  return Object.entries(fields)
    .filter(([field]) => field === 'document' || field.startsWith('document.'))
    .map(([field, message]) => ({ field, message, ...locate(doc, field.split('.').slice(1)) }));
}

function locate(doc: ProseMirrorNode, keys: string[]): { where: string; position: number | null } {
  const parts: string[] = [];
  let node: ProseMirrorNode | null = doc;
  let position: number | null = null;
  // Start of the current node's content: the doc has no opening token.
  let contentStart = 0;
  let index = 0;
  while (index < keys.length) {
    const key = keys[index];
    if (key === 'content' && node && index + 1 < keys.length) {
      const childIndex = Number(keys[index + 1]);
      if (!Number.isInteger(childIndex) || childIndex >= node.childCount) break;
      let offset = contentStart;
      for (let i = 0; i < childIndex; i += 1) offset += node.child(i).nodeSize;
      const child = node.child(childIndex);
      const name = nodeNames[child.type.name] ?? child.type.name;
      parts.push(node === doc ? `Block ${childIndex + 1} (${name})` : `${name} ${childIndex + 1}`);
      position = offset;
      contentStart = offset + 1;
      node = child;
      index += 2;
    } else if (key === 'marks') {
      const mark = node?.marks[Number(keys[index + 1])];
      parts.push(mark ? (mark.type.name === 'link' ? 'link' : `${mark.type.name} mark`) : 'formatting');
      index += 2;
    } else if (key === 'attrs') {
      const attribute = keys[index + 1];
      if (attribute) parts.push(attributeNames[attribute] ?? attribute);
      break;
    } else {
      break;
    }
  }
  return { where: parts.length > 0 ? parts.join(' › ') : 'The page', position };
}
