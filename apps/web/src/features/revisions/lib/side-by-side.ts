import type { TextChange } from '@limitbook/contracts';

export type Side = { text: string; kind: 'added' | 'removed' | 'unchanged' };
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
    for (let line = 0; line < Math.max(removed.length, added.length); line += 1) rows.push({ left: removed[line] ?? null, right: added[line] ?? null });
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
