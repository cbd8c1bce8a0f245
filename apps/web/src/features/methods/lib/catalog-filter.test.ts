import type { MethodSummary } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { filterMethods, methodSource, shortDescription } from './catalog-filter';

function method(id: string, title: string, extra: Partial<MethodSummary> = {}): MethodSummary {
  return { id, version: 1, title, description: '', references: [], cautions: [], inputSchema: {}, outputs: [], ...extra };
}

const methods = [
  method('iso286-fit', 'Limits and fits', { references: ['ISO 286-2:2010'] }),
  method('wall-thickness', 'Wall between two features of size', { description: 'Minimum and maximum wall.' }),
  method('house:o-ring-squeeze', 'O-ring squeeze', { source: 'in-house' }),
];

describe('filterMethods', () => {
  it('keeps one source', () => {
    expect(filterMethods(methods, { source: 'in-house', text: '' }).map((item) => item.id)).toEqual(['house:o-ring-squeeze']);
    expect(filterMethods(methods, { source: 'built-in', text: '' })).toHaveLength(2);
  });

  it('matches every word in id, title, description or references, in any case', () => {
    expect(filterMethods(methods, { source: 'all', text: 'iso 286-2' }).map((item) => item.id)).toEqual(['iso286-fit']);
    expect(filterMethods(methods, { source: 'all', text: 'MINIMUM wall' }).map((item) => item.id)).toEqual(['wall-thickness']);
    expect(filterMethods(methods, { source: 'all', text: 'wall squeeze' })).toEqual([]);
  });
});

describe('methodSource', () => {
  it('reads the id when the server leaves the source out', () => {
    expect(methodSource({ id: 'house:x-y' })).toBe('in-house');
    expect(methodSource({ id: 'stack-1d' })).toBe('built-in');
  });
});

describe('shortDescription', () => {
  it('takes the first sentence and shortens what is still too long', () => {
    expect(shortDescription('First part. Second part.')).toBe('First part.');
    expect(shortDescription('x'.repeat(300), 20)).toHaveLength(20);
  });
});
