import type { JSONContent } from '@tiptap/core';

export interface ExtractTextOptions {
  /**
   * Include the LaTeX source of math nodes, as written, set apart by spaces (default): a symbol
   * that only appears in a formula is still found, and snippets have no holes where formulas stood.
   */
  includeMath?: boolean;
}

const inlineAtoms = new Set(['text', 'hardBreak', 'inlineMath']);

function nonBlank(...values: unknown[]): string[] {
  return values.filter((value): value is string => typeof value === 'string' && value.trim() !== '');
}

function blockAttributeText(node: JSONContent, includeMath: boolean): string[] {
  const attrs = node.attrs ?? {};
  switch (node.type) {
    case 'calculatorBlock':
      return nonBlank(attrs.caption);
    case 'image':
      return nonBlank(attrs.alt, attrs.title);
    case 'attachment':
      return nonBlank(attrs.name);
    case 'blockMath':
      return includeMath ? nonBlank(attrs.latex) : [];
    default:
      return [];
  }
}

function inlineText(node: JSONContent, includeMath: boolean): string {
  if (node.type === 'text') return node.text ?? '';
  if (node.type === 'hardBreak') return '\n';
  // Spaces either side either way, so the words around a formula never run together.
  if (node.type === 'inlineMath') return includeMath ? ` ${nonBlank(node.attrs?.latex).join('')} ` : ' ';
  return '';
}

function collectLines(node: JSONContent, includeMath: boolean, lines: string[]): void {
  lines.push(...blockAttributeText(node, includeMath));
  const children = node.content ?? [];
  if (children.some((child) => inlineAtoms.has(child.type ?? ''))) {
    lines.push(children.map((child) => inlineText(child, includeMath)).join(''));
    return;
  }
  for (const child of children) collectLines(child, includeMath, lines);
}

/**
 * Plain text of a page for full-text search: the text of headings, paragraphs, lists,
 * tables, code and cautions, the LaTeX source of formulas, calculator block captions,
 * image alt texts and attachment names, one block per line.
 */
export function extractText(doc: JSONContent, options: ExtractTextOptions = {}): string {
  const lines: string[] = [];
  collectLines(doc, options.includeMath ?? true, lines);
  return lines
    .flatMap((line) => line.split('\n'))
    .map((line) => line.replace(/\s+/g, ' ').trim())
    .filter((line) => line !== '')
    .join('\n');
}
