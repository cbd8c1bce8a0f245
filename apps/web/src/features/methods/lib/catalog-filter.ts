import { isHouseMethodId, type MethodSummary } from '@limitbook/contracts';

export type MethodSource = 'built-in' | 'in-house';
export type SourceFilter = MethodSource | 'all';

/** Where a method comes from; older servers leave `source` out, and in-house ids say so themselves. */
export function methodSource(method: Pick<MethodSummary, 'id' | 'source'>): MethodSource {
  return method.source ?? (isHouseMethodId(method.id) ? 'in-house' : 'built-in');
}

function words(text: string): string[] {
  return text.toLowerCase().split(/\s+/).filter(Boolean);
}

/** Methods of the chosen source whose id, title, description or references hold every typed word. */
export function filterMethods<T extends MethodSummary>(methods: readonly T[], { source, text }: { source: SourceFilter; text: string }): T[] {
  const wanted = words(text);
  return methods.filter((method) => {
    if (source !== 'all' && methodSource(method) !== source) return false;
    if (wanted.length === 0) return true;
    const haystack = [method.id, method.title, method.description, ...method.references].join(' ').toLowerCase();
    return wanted.every((word) => haystack.includes(word));
  });
}

/** The first sentence of a description, for a catalog row. */
export function shortDescription(description: string, max = 180): string {
  const first = /^(.+?[.!?])(\s|$)/s.exec(description.trim())?.[1] ?? description.trim();
  return first.length > max ? `${first.slice(0, max - 1).trimEnd()}…` : first;
}
