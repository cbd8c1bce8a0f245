import { Image } from '@tiptap/extension-image';
import { isSafeImageSrc } from '../urls/safe-url.js';

function parseDimension(value: string | null): number | null {
  const dimension = Number.parseInt(value ?? '', 10);
  return Number.isInteger(dimension) && dimension > 0 ? dimension : null;
}

/** A block image from our own file storage (`/api/files/<uuid>`) or an `http(s)` address. */
export const LimitbookImage = Image.extend({
  addAttributes() {
    return {
      ...this.parent?.(),
      width: { default: null, parseHTML: (element) => parseDimension(element.getAttribute('width')) },
      height: { default: null, parseHTML: (element) => parseDimension(element.getAttribute('height')) },
    };
  },

  parseHTML() {
    return [{ tag: 'img[src]', getAttrs: (element) => (isSafeImageSrc(element.getAttribute('src')) ? null : false) }];
  },
}).configure({ inline: false, allowBase64: false });
