import { describe, expect, it } from 'vitest';
import { unknownQuantity } from './unknown-quantity.js';

describe('unknownQuantity', () => {
  it('names the one quantity left empty, whether undefined or null', () => {
    expect(unknownQuantity({ holeSize: 10.5, fastenerSize: 10 })).toBe('positionTolerance');
    expect(unknownQuantity({ holeSize: null, fastenerSize: 10, positionTolerance: 0.5 })).toBe('holeSize');
  });

  it('fails loudly if the schema let zero or two unknowns through', () => {
    expect(() => unknownQuantity({ holeSize: 10.5, fastenerSize: 10, positionTolerance: 0.5 })).toThrow(/exactly one/);
    expect(() => unknownQuantity({ holeSize: 10.5 })).toThrow(/exactly one/);
  });
});
