import { describe, expect, it } from 'vitest';
import { submitBlocker } from './submit-blocker';

const passing = { pass: true, passed: 2, failed: 0, rows: [] };

describe('submitBlocker', () => {
  it('asks for fixes, then rows, then a current passing run', () => {
    expect(submitBlocker({ problems: { 'outputs.0.expression': 'Unknown name d' }, testCount: 1, run: passing, runOutdated: false })).toMatch(/message at the fields/);
    expect(submitBlocker({ problems: {}, testCount: 0, run: null, runOutdated: false })).toMatch(/test row/);
    expect(submitBlocker({ problems: {}, testCount: 2, run: passing, runOutdated: true })).toMatch(/run the tests/);
    expect(submitBlocker({ problems: {}, testCount: 2, run: { ...passing, pass: false, passed: 1, failed: 1 }, runOutdated: false })).toBe('1 test row fails.');
  });

  it('lets a definition with a current passing run through', () => {
    expect(submitBlocker({ problems: {}, testCount: 2, run: passing, runOutdated: false })).toBeNull();
  });
});
