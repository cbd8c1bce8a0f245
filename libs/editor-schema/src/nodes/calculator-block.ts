import { Node, mergeAttributes, type Attribute } from '@tiptap/core';
import { Plugin, PluginKey } from '@tiptap/pm/state';
import type { CalculatorBlockAttrsInput } from '../calculator/calculator-block-attrs.js';

function parseJsonAttribute(raw: string | null, fallback: unknown): unknown {
  if (raw === null) return fallback;
  try {
    return JSON.parse(raw) as unknown;
  } catch {
    return fallback;
  }
}

function jsonAttribute(key: string, name: string, fallback: unknown): Attribute {
  return {
    default: fallback,
    parseHTML: (element) => parseJsonAttribute(element.getAttribute(name), fallback),
    renderHTML: (attributes) => ({ [name]: JSON.stringify(attributes[key] ?? fallback) }),
  };
}

function textAttribute(key: string, name: string, fallback: string | null): Attribute {
  return {
    default: fallback,
    parseHTML: (element) => element.getAttribute(name) ?? fallback,
    renderHTML: (attributes) => (attributes[key] == null ? {} : { [name]: String(attributes[key]) }),
  };
}

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    calculatorBlock: {
      /** Inserts a calculator block; a fresh `blockId` is given when none is passed. */
      insertCalculatorBlock: (attrs: Omit<CalculatorBlockAttrsInput, 'blockId'> & { blockId?: string }) => ReturnType;
    };
  }
}

const uniqueBlockIdsKey = new PluginKey('calculatorBlockUniqueIds');
const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[1-8][0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/i;

/**
 * The calculator block: an atom whose attributes say which method runs, with which
 * defaults, locked inputs, acceptance rule and caption. View-less; the web app adds its
 * node view with `CalculatorBlock.extend({ addNodeView })`.
 */
export const CalculatorBlock = Node.create({
  name: 'calculatorBlock',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,
  isolating: true,

  addAttributes() {
    return {
      blockId: textAttribute('blockId', 'data-block-id', null),
      method: textAttribute('method', 'data-method', ''),
      methodVersion: {
        default: null,
        parseHTML: (element) => {
          const version = Number.parseInt(element.getAttribute('data-method-version') ?? '', 10);
          return Number.isInteger(version) && version > 0 ? version : null;
        },
        renderHTML: (attributes) =>
          attributes.methodVersion == null ? {} : { 'data-method-version': String(attributes.methodVersion) },
      },
      unit: {
        default: 'mm',
        parseHTML: (element) => (element.getAttribute('data-unit') === 'in' ? 'in' : 'mm'),
        renderHTML: (attributes) => ({ 'data-unit': attributes.unit }),
      },
      defaults: jsonAttribute('defaults', 'data-defaults', {}),
      locked: jsonAttribute('locked', 'data-locked', []),
      acceptance: jsonAttribute('acceptance', 'data-acceptance', null),
      caption: textAttribute('caption', 'data-caption', ''),
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="calculator-block"][data-method]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', mergeAttributes({ 'data-type': 'calculator-block' }, HTMLAttributes)];
  },

  addCommands() {
    return {
      insertCalculatorBlock:
        (attrs) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { ...attrs, blockId: attrs.blockId ?? crypto.randomUUID() } }),
    };
  },

  addProseMirrorPlugins() {
    const typeName = this.name;
    // Copy and paste would otherwise duplicate a blockId (or bring a malformed one), which the server refuses.
    return [
      new Plugin({
        key: uniqueBlockIdsKey,
        appendTransaction(transactions, _oldState, newState) {
          if (!transactions.some((transaction) => transaction.docChanged)) return null;
          const seen = new Set<string>();
          const transaction = newState.tr;
          newState.doc.descendants((node, position) => {
            if (node.type.name !== typeName) return !node.isTextblock;
            const blockId = node.attrs.blockId as unknown;
            if (typeof blockId === 'string' && uuidPattern.test(blockId) && !seen.has(blockId)) {
              seen.add(blockId);
            } else {
              const freshId = crypto.randomUUID();
              seen.add(freshId);
              transaction.setNodeMarkup(position, undefined, { ...node.attrs, blockId: freshId });
            }
            return false;
          });
          return transaction.docChanged ? transaction.setMeta('addToHistory', false) : null;
        },
      }),
    ];
  },
});
