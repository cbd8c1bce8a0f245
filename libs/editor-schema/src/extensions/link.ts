import { Link } from '@tiptap/extension-link';
import { isSafeHref } from '../urls/safe-url.js';

const linkRel = 'noopener noreferrer nofollow';

/**
 * Links to `http(s)`, `mailto` or a path on this site; anything else is refused when
 * typed, pasted or set. External links open in a new tab without an opener.
 */
export const LimitbookLink = Link.extend({
  addAttributes() {
    return {
      href: { default: null, parseHTML: (element) => element.getAttribute('href') },
      // Pasted HTML may carry any target, rel or class; keep only what the editor itself sets.
      target: { default: '_blank', parseHTML: (element) => (element.getAttribute('target') === '_self' ? '_self' : '_blank') },
      rel: { default: linkRel, parseHTML: () => linkRel },
      title: { default: null },
    };
  },
}).configure({
  openOnClick: false,
  autolink: true,
  defaultProtocol: 'https',
  protocols: [],
  HTMLAttributes: { target: '_blank', rel: linkRel, class: null },
  isAllowedUri: (url) => isSafeHref(url),
});
