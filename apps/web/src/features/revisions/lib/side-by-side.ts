import type { TextChange } from '@limitbook/contracts';
import { diffWordsWithSpace } from 'diff';

/** A stretch of a changed line: `changed` marks the words that differ from the paired line. */
export type Span = { text: string; changed: boolean };
export type Side = { text: string; kind: 'added' | 'removed' | 'unchanged'; spans?: Span[] };
export type DiffRow = { kind: 'line'; left: Side | null; right: Side | null } | { kind: 'gap'; count: number; lines: { left: Side; right: Side }[] };

/**
 * Lays a line diff out in two columns: unchanged lines on both sides, a run of removed lines
 * beside the run of added lines that replaced it, and long unchanged stretches folded to
 * `context` lines either side of a change.
 */
export function sideBySide(changes: TextChange[], context = 2): DiffRow[] {
  const rows: { left: Side | null; right: Side | null }[] = [];
  let index = 0;
  while (index < changes.length) {
    const change = changes[index]!;
    if (change.kind === 'unchanged') {
      rows.push({ left: { ...change }, right: { ...change } });
      index += 1;
      continue;
    }
    const removed: Side[] = [];
    const added: Side[] = [];
    while (index < changes.length && changes[index]!.kind === 'removed') removed.push({ ...changes[index++]! });
    while (index < changes.length && changes[index]!.kind === 'added') added.push({ ...changes[index++]! });
    for (let line = 0; line < Math.max(removed.length, added.length); line += 1) {
      const left = removed[line] ?? null;
      const right = added[line] ?? null;
      if (left && right) markWords(left, right);
      rows.push({ left, right });
    }
  }

  const changed = rows.map((row) => row.left?.kind !== 'unchanged' || row.right?.kind !== 'unchanged');
  const near = (at: number) => changed.some((isChanged, other) => isChanged && Math.abs(other - at) <= context);
  const out: DiffRow[] = [];
  let folded: { left: Side; right: Side }[] = [];
  const flush = () => {
    if (folded.length > 0) out.push({ kind: 'gap', count: folded.length, lines: folded });
    folded = [];
  };
  rows.forEach((row, at) => {
    if (!changed[at] && !near(at)) {
      folded.push({ left: row.left!, right: row.right! });
      return;
    }
    flush();
    out.push({ kind: 'line', ...row });
  });
  flush();
  return out;
}

/**
 * Marks the words that differ between a removed line and the added line beside it, so a
 * changed number inside a long paragraph stands out. Lines with little in common stay whole.
 */
function markWords(left: Side, right: Side) {
  const parts = diffWordsWithSpace(left.text, right.text);
  const common = parts.filter((part) => !part.added && !part.removed).reduce((sum, part) => sum + part.value.trim().length, 0);
  if (common < Math.min(left.text.length, right.text.length) * 0.4) return;
  left.spans = parts.filter((part) => !part.added).map((part) => ({ text: part.value, changed: !!part.removed }));
  right.spans = parts.filter((part) => !part.removed).map((part) => ({ text: part.value, changed: !!part.added }));
}
