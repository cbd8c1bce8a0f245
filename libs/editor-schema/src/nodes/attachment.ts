import { Node } from '@tiptap/core';
import { fileUrl } from '../urls/safe-url.js';

/** An attached file (PDF, CSV, image…) shown as a download link; the file itself lives in file storage. */
export const Attachment = Node.create({
  name: 'attachment',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      fileId: { default: null, parseHTML: (element) => element.getAttribute('data-file-id'), renderHTML: () => ({}) },
      name: { default: '', parseHTML: (element) => element.getAttribute('data-name') ?? '', renderHTML: () => ({}) },
      size: {
        default: 0,
        parseHTML: (element) => {
          const size = Number.parseInt(element.getAttribute('data-size') ?? '', 10);
          return Number.isInteger(size) && size >= 0 ? size : 0;
        },
        renderHTML: () => ({}),
      },
      contentType: {
        default: 'application/octet-stream',
        parseHTML: (element) => element.getAttribute('data-content-type') ?? 'application/octet-stream',
        renderHTML: () => ({}),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="attachment"]' }];
  },

  renderHTML({ node }) {
    const { fileId, name, size, contentType } = node.attrs as { fileId: string; name: string; size: number; contentType: string };
    return [
      'div',
      { 'data-type': 'attachment', 'data-file-id': fileId, 'data-name': name, 'data-size': String(size), 'data-content-type': contentType },
      ['a', { href: fileUrl(fileId), download: name }, name],
    ];
  },
});
