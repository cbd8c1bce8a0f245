import type { TextRange } from '@limitbook/contracts';
import { Fragment } from 'react';
import classes from './library.module.css';

/** Clamps, sorts and merges ranges so every character is marked at most once. */
export function normalizeRanges(ranges: TextRange[], length: number): TextRange[] {
  const sorted = ranges
    .map((range) => ({ start: Math.max(0, Math.min(length, range.start)), end: Math.max(0, Math.min(length, range.end)) }))
    .filter((range) => range.end > range.start)
    .sort((a, b) => a.start - b.start);
  const merged: TextRange[] = [];
  for (const range of sorted) {
    const last = merged.at(-1);
    if (last && range.start <= last.end) last.end = Math.max(last.end, range.end);
    else merged.push({ ...range });
  }
  return merged;
}

/** Plain text with the matched stretches marked; the text is never read as HTML. */
export function HighlightedText({ text, ranges }: { text: string; ranges: TextRange[] }) {
  const parts: { text: string; marked: boolean }[] = [];
  let position = 0;
  for (const range of normalizeRanges(ranges, text.length)) {
    if (range.start > position) parts.push({ text: text.slice(position, range.start), marked: false });
    parts.push({ text: text.slice(range.start, range.end), marked: true });
    position = range.end;
  }
  if (position < text.length) parts.push({ text: text.slice(position), marked: false });
  return (
    <>
      {parts.map((part, index) =>
        part.marked ? (
          <mark key={index} className={classes.mark}>
            {part.text}
          </mark>
        ) : (
          <Fragment key={index}>{part.text}</Fragment>
        ),
      )}
    </>
  );
}
