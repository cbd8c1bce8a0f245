import { type BlockChange, type BlockSettingChange, type TextChange } from '@limitbook/contracts';
import { type CalculatorBlockAttrs, extractText, formatAcceptanceRule, listCalculatorBlocks } from '@limitbook/editor-schema';
import { diffLines } from 'diff';

type Doc = Parameters<typeof extractText>[0];

/** Line-level changes of the plain text of two page bodies; one chunk per line. */
export function compareText(from: Doc, to: Doc): TextChange[] {
  const changes: TextChange[] = [];
  for (const part of diffLines(extractText(from), extractText(to))) {
    const kind = part.added ? 'added' : part.removed ? 'removed' : 'unchanged';
    for (const line of part.value.split('\n')) if (line !== '') changes.push({ kind, text: line });
  }
  return changes;
}

/** Stable text for a JSON value, so `{a:1,b:2}` and `{b:2,a:1}` compare equal. */
function show(value: unknown): string | null {
  if (value === undefined) return null;
  if (typeof value === 'string') return value;
  const sorted = (v: unknown): unknown =>
    Array.isArray(v) ? v.map(sorted) : v && typeof v === 'object' ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : 1)).map(([k, x]) => [k, sorted(x)])) : v;
  return JSON.stringify(sorted(value));
}

/** Leaf values of the defaults by dotted input path (`contributors.0.tolerance`). */
function flatten(value: unknown, prefix: string, into: Map<string, unknown>): Map<string, unknown> {
  if (value && typeof value === 'object') {
    const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
    if (entries.length === 0 && prefix) into.set(prefix, value);
    for (const [key, child] of entries) flatten(child, prefix ? `${prefix}.${key}` : key, into);
  } else if (prefix) into.set(prefix, value);
  return into;
}

const methodLabel = (block: CalculatorBlockAttrs) => `${block.method}${block.methodVersion === null ? ' (latest released)' : ` v${block.methodVersion}`}`;

function blockRows(from: CalculatorBlockAttrs, to: CalculatorBlockAttrs): BlockSettingChange[] {
  const rows: BlockSettingChange[] = [];
  const add = (setting: BlockSettingChange['setting'], path: string | null, a: string | null, b: string | null) => {
    if (a !== b) rows.push({ setting, path, from: a, to: b });
  };
  add('method', null, methodLabel(from), methodLabel(to));
  add('unit', null, from.unit, to.unit);
  add('acceptance', null, from.acceptance ? formatAcceptanceRule(from.acceptance) : null, to.acceptance ? formatAcceptanceRule(to.acceptance) : null);
  add('caption', null, from.caption || null, to.caption || null);
  const before = flatten(from.defaults, '', new Map());
  const after = flatten(to.defaults, '', new Map());
  for (const path of [...new Set([...before.keys(), ...after.keys()])].sort()) add('default', path, show(before.get(path)), show(after.get(path)));
  const lockedBefore = new Set(from.locked);
  const lockedAfter = new Set(to.locked);
  for (const path of [...new Set([...from.locked, ...to.locked])].sort()) {
    add('locked', path, lockedBefore.has(path) ? 'locked' : 'open', lockedAfter.has(path) ? 'locked' : 'open');
  }
  return rows;
}

/** Calculator blocks matched by `blockId`; unchanged blocks are left out. Order: the newer page's, then removed ones. */
export function compareBlocks(from: Doc, to: Doc): BlockChange[] {
  const before = new Map(listCalculatorBlocks(from).map((block) => [block.blockId, block]));
  const after = listCalculatorBlocks(to);
  const changes: BlockChange[] = [];
  for (const block of after) {
    const old = before.get(block.blockId);
    if (!old) {
      changes.push({ blockId: block.blockId, change: 'added', method: methodLabel(block), caption: block.caption || null, rows: [] });
      continue;
    }
    const rows = blockRows(old, block);
    if (rows.length > 0) changes.push({ blockId: block.blockId, change: 'changed', method: methodLabel(block), caption: block.caption || null, rows });
  }
  const kept = new Set(after.map((block) => block.blockId));
  for (const old of before.values()) {
    if (!kept.has(old.blockId)) changes.push({ blockId: old.blockId, change: 'removed', method: methodLabel(old), caption: old.caption || null, rows: [] });
  }
  return changes;
}
