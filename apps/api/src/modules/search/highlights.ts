import { type TextRange } from '@limitbook/contracts';
import { highlightEnd, highlightStart } from '../library/page-content.js';

/**
 * Turns ts_headline output, whose matches are wrapped in private-use marker characters,
 * into plain text and the ranges to highlight. Whitespace runs (line breaks between
 * blocks) become single spaces first, so the ranges index the returned text.
 */
export function markedToRanges(marked: string): { text: string; ranges: TextRange[] } {
  const ranges: TextRange[] = [];
  let text = '';
  let start: number | null = null;
  for (const character of marked) {
    if (/\s/.test(character)) {
      if (text !== '' && !text.endsWith(' ')) text += ' ';
    } else if (character === highlightStart) {
      start ??= text.length;
    } else if (character === highlightEnd) {
      if (start !== null && text.length > start) {
        const previous = ranges[ranges.length - 1];
        // Adjacent words of a phrase come back as separate matches; one range reads better.
        if (previous && (previous.end === start || text.slice(previous.end, start) === ' ')) previous.end = text.length;
        else ranges.push({ start, end: text.length });
      }
      start = null;
    } else {
      text += character;
    }
  }
  if (text.endsWith(' ')) {
    text = text.slice(0, -1);
    for (const range of ranges) range.end = Math.min(range.end, text.length);
  }
  return { text, ranges };
}
