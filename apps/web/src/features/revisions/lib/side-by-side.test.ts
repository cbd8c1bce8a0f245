import { describe, expect, it } from 'vitest';
import { sideBySide } from './side-by-side';

const same = (text: string) => ({ kind: 'unchanged' as const, text });

describe('sideBySide', () => {
  it('pairs a changed line with its replacement and keeps context around it', () => {
    const rows = sideBySide([same('a'), same('b'), same('c'), same('d'), { kind: 'removed', text: 'old rule' }, { kind: 'added', text: 'new rule' }, same('e')], 1);
    expect(rows).toEqual([
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
});
