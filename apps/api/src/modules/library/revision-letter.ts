/**
 * Revision letters as engineering drawings use them (ASME Y14.35): A, B, C … Y, then AA, AB …
 * AY, BA … Letters that read as digits or are easily confused (I, O, Q, S, X, Z) are never used.
 */
export const revisionAlphabet = 'ABCDEFGHJKLMNPRTUVWY';

/** The letter of the n-th release, counting from 1. */
export function revisionLetterAt(n: number): string {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`A release number starts at 1, got ${n}`);
  const base = revisionAlphabet.length;
  let rest = n;
  let letters = '';
  // Bijective base-20: there is no "zero" letter, so AA follows Y.
  while (rest > 0) {
    const digit = (rest - 1) % base;
    letters = revisionAlphabet[digit] + letters;
    rest = Math.floor((rest - 1) / base);
  }
  return letters;
}

/** Position of a letter in the sequence (A = 1); undefined for anything that is not a revision letter. */
export function revisionLetterIndex(letter: string): number | undefined {
  if (!/^[A-Z]+$/.test(letter)) return undefined;
  let n = 0;
  for (const char of letter) {
    const digit = revisionAlphabet.indexOf(char);
    if (digit < 0) return undefined;
    n = n * revisionAlphabet.length + digit + 1;
  }
  return n;
}

/** The letter after `previous`, or A for the first release. */
export function nextRevisionLetter(previous: string | null | undefined): string {
  if (!previous) return 'A';
  const index = revisionLetterIndex(previous);
  if (index === undefined) throw new RangeError(`${previous} is not a revision letter`);
  return revisionLetterAt(index + 1);
}
