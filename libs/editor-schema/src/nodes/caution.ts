import { Node } from '@tiptap/core';

export const cautionLevels = ['caution', 'warning', 'note'] as const;
export type CautionLevel = (typeof cautionLevels)[number];

function toCautionLevel(value: string | null): CautionLevel {
  return cautionLevels.find((level) => level === value) ?? 'caution';
}

/** A callout for safety and scope notes, holding paragraphs and lists. */
export const Caution = Node.create({
  name: 'caution',
  group: 'block',
  content: '(paragraph | bulletList | orderedList)+',
  defining: true,

  addAttributes() {
    return {
      level: {
        default: 'caution' satisfies CautionLevel,
        parseHTML: (element) => toCautionLevel(element.getAttribute('data-level')),
        renderHTML: (attributes) => ({ 'data-level': attributes.level }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="caution"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', { 'data-type': 'caution', role: 'note', ...HTMLAttributes }, 0];
  },
});
