import { gradeNames, type GradeName } from './tables/standard-tolerance-grades.js';
import { type FeatureSide, type ToleranceClass } from './tolerance-class.js';

/** The fundamental deviations of ISO 286-1 (letters I, L, O, Q and W are never used). */
export const holeLetters = ['A', 'B', 'C', 'CD', 'D', 'E', 'EF', 'F', 'FG', 'G', 'H', 'J', 'JS', 'K', 'M', 'N', 'P', 'R', 'S', 'T', 'U', 'V', 'X', 'Y', 'Z', 'ZA', 'ZB', 'ZC'] as const;
export const shaftLetters = holeLetters.map((letter) => letter.toLowerCase());

const designationPattern = /^([A-Za-z]{1,2})(\d{1,2})$/;

export type ParseResult = { ok: true; value: ToleranceClass } | { ok: false; message: string };

/**
 * Reads a tolerance class such as "H7", "js6" or "ZC11". Case carries meaning in ISO 286:
 * capital letters are holes, lower-case letters are shafts, so "h7" is refused as a hole.
 */
export function parseToleranceClass(text: string, side: FeatureSide): ParseResult {
  const designation = text.trim();
  const example = side === 'hole' ? 'H7' : 'g6';
  if (designation === '') return { ok: false, message: `Give a ${side} tolerance class such as ${example}` };

  const match = designationPattern.exec(designation);
  if (!match) {
    return { ok: false, message: `"${designation}" is not a tolerance class: write a deviation letter and a grade, such as ${example}` };
  }
  const letter = match[1] as string;
  const gradeText = match[2] as string;

  const upper = letter.toUpperCase();
  if (!(holeLetters as readonly string[]).includes(upper)) {
    return { ok: false, message: `ISO 286 has no fundamental deviation "${letter}" (letters I, L, O, Q and W are not used)` };
  }
  if (letter !== upper && letter !== letter.toLowerCase()) {
    return { ok: false, message: `Write "${upper}" for a hole or "${letter.toLowerCase()}" for a shaft: mixed case is not a tolerance class` };
  }
  if (side === 'hole' && letter !== upper) {
    return { ok: false, message: `Holes use capital letters: write ${upper}${gradeText}, not ${designation} (lower-case letters are shafts)` };
  }
  if (side === 'shaft' && letter === upper) {
    const lower = letter.toLowerCase();
    return { ok: false, message: `Shafts use lower-case letters: write ${lower}${gradeText}, not ${designation} (capital letters are holes)` };
  }
  if (!(gradeNames as readonly string[]).includes(gradeText)) {
    return { ok: false, message: `"${gradeText}" is not a standard tolerance grade: ISO 286-1 has IT01, IT0 and IT1 to IT18` };
  }
  return { ok: true, value: { side, letter, grade: gradeText as GradeName, designation } };
}
