import { describe, expect, it } from 'vitest';
import { nextRevisionLetter, revisionLetterAt, revisionLetterIndex } from './revision-letter.js';

// ASME Y14.35 (Revision of Engineering Drawings and Associated Documents): revisions are
// lettered A, B, C …, the letters I, O, Q, S, X and Z are not used, and after Y come AA, AB …
describe('revision letters (ASME Y14.35)', () => {
  it('starts at A and runs through the single letters without I, O, Q, S, X, Z', () => {
    const singles = Array.from({ length: 20 }, (_, i) => revisionLetterAt(i + 1));
    expect(singles.join('')).toBe('ABCDEFGHJKLMNPRTUVWY');
    for (const banned of ['I', 'O', 'Q', 'S', 'X', 'Z']) expect(singles).not.toContain(banned);
    expect(nextRevisionLetter(null)).toBe('A');
    expect(nextRevisionLetter('H')).toBe('J');
    expect(nextRevisionLetter('N')).toBe('P');
    expect(nextRevisionLetter('P')).toBe('R');
    expect(nextRevisionLetter('R')).toBe('T');
    expect(nextRevisionLetter('W')).toBe('Y');
  });

  it('steps from Y to AA, and from AY to BA, YY to AAA', () => {
    expect(nextRevisionLetter('Y')).toBe('AA');
    expect(nextRevisionLetter('AA')).toBe('AB');
    expect(nextRevisionLetter('AH')).toBe('AJ');
    expect(nextRevisionLetter('AY')).toBe('BA');
    expect(nextRevisionLetter('YY')).toBe('AAA');
  });

  it('gives a long sequence of distinct letters, none holding a banned letter, each the successor of the one before', () => {
    const seen = new Set<string>();
    let letter: string | null = null;
    for (let n = 1; n <= 1000; n += 1) {
      letter = nextRevisionLetter(letter);
      expect(letter).toBe(revisionLetterAt(n));
      expect(revisionLetterIndex(letter)).toBe(n);
      expect(letter).not.toMatch(/[IOQSXZ]/);
      seen.add(letter);
    }
    expect(seen.size).toBe(1000);
    expect(revisionLetterAt(21)).toBe('AA');
    expect(revisionLetterAt(40)).toBe('AY');
    expect(revisionLetterAt(41)).toBe('BA');
    expect(revisionLetterAt(420)).toBe('YY');
    expect(revisionLetterAt(421)).toBe('AAA');
  });

  it('rejects what is not a revision letter', () => {
    expect(revisionLetterIndex('I')).toBeUndefined();
    expect(revisionLetterIndex('a')).toBeUndefined();
    expect(() => nextRevisionLetter('AO')).toThrow(RangeError);
    expect(() => revisionLetterAt(0)).toThrow(RangeError);
  });
});
