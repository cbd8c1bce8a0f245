import { describe, expect, it } from 'vitest';
import { sideBySide } from './side-by-side';

const same = (text: string) => ({ kind: 'unchanged' as const, text });

describe('sideBySide', () => {
  it('pairs a changed line with its replacement and keeps context around it', () => {
    const rows = sideBySide([same('a'), same('b'), same('c'), same('d'), { kind: 'removed', text: 'old rule' }, { kind: 'added', text: 'new rule' }, same('e')], 1);
    expect(rows).toMatchObject([
      { kind: 'gap', count: 3, lines: expect.any(Array) },
      { kind: 'line', left: same('d'), right: same('d') },
      { kind: 'line', left: { kind: 'removed', text: 'old rule' }, right: { kind: 'added', text: 'new rule' } },
      { kind: 'line', left: same('e'), right: same('e') },
    ]);
  });

  it('leaves the other side empty for pure insertions and deletions', () => {
    const rows = sideBySide([{ kind: 'removed', text: 'gone' }, same('kept'), { kind: 'added', text: 'one' }, { kind: 'added', text: 'two' }]);
    expect(rows.map((row) => (row.kind === 'line' ? [row.left?.text ?? null, row.right?.text ?? null] : row.count))).toEqual([
      ['gone', null],
      ['kept', 'kept'],
      [null, 'one'],
      [null, 'two'],
    ]);
  });

  it('marks the changed words of a line beside its replacement, and leaves rewritten lines whole', () => {
    const [row] = sideBySide([
      { kind: 'removed', text: 'Keep at least 1.5 mm of wall around the bore.' },
      { kind: 'added', text: 'Keep at least 2 mm of wall around the bore.' },
    ]);
    expect(row).toMatchObject({ kind: 'line' });
    if (row?.kind !== 'line') return;
    expect(row.left?.spans?.filter((span) => span.changed).map((span) => span.text)).toEqual(['1.5']);
    expect(row.right?.spans?.filter((span) => span.changed).map((span) => span.text)).toEqual(['2']);
    expect(row.right?.spans?.map((span) => span.text).join('')).toBe('Keep at least 2 mm of wall around the bore.');

    const [rewritten] = sideBySide([
      { kind: 'removed', text: 'Scope' },
      { kind: 'added', text: 'Definitions and symbols used here' },
    ]);
    expect(rewritten?.kind === 'line' && rewritten.right?.spans).toBeUndefined();
  });
});
