import { Node, type Attribute } from '@tiptap/core';

/** Longest LaTeX source accepted in one math node. */
export const maxLatexLength = 4000;

const latexAttribute: Attribute = {
  default: '',
  parseHTML: (element) => element.getAttribute('data-latex') ?? element.textContent ?? '',
  renderHTML: (attributes) => ({ 'data-latex': attributes.latex }),
};

/** LaTeX inside a line of text. The web app renders it with KaTeX in its node view. */
export const InlineMath = Node.create({
  name: 'inlineMath',
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return { latex: latexAttribute };
  },

  parseHTML() {
    return [{ tag: 'span[data-type="inline-math"]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    return ['span', { 'data-type': 'inline-math', ...HTMLAttributes }, String(node.attrs.latex)];
  },
});

/** A displayed LaTeX formula on its own line. */
export const BlockMath = Node.create({
  name: 'blockMath',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return { latex: latexAttribute };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="block-math"]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    return ['div', { 'data-type': 'block-math', ...HTMLAttributes }, String(node.attrs.latex)];
  },
});
