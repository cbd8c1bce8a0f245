import { type Iso2768GeometricClass, type Iso2768LinearClass } from '@limitbook/contracts';

export interface GeneralToleranceDesignation {
  linearClass?: Iso2768LinearClass;
  geometricClass?: Iso2768GeometricClass;
  /** "-E": the envelope requirement applies to all single features of size (ISO 2768-2 clause 5). */
  envelope: boolean;
}

const pattern = /^(?:ISO\s*)?(?:2768\s*-\s*)?([fmcv])?([HKL])?(?:\s*-\s*(E))?$/;

/**
 * Reads a title-block note such as "ISO 2768-mK", "ISO 2768-f", "ISO 2768-K" or "mH-E": a lower-case
 * class of part 1 (f, m, c, v) and/or a capital class of part 2 (H, K, L).
 */
export function parseGeneralToleranceDesignation(text: string): { ok: true; value: GeneralToleranceDesignation } | { ok: false; message: string } {
  const match = pattern.exec(text.trim());
  if (!match || (!match[1] && !match[2])) {
    return { ok: false, message: `"${text.trim()}" is not an ISO 2768 designation: write it as on a title block, such as ISO 2768-mK` };
  }
  return {
    ok: true,
    value: {
      ...(match[1] ? { linearClass: match[1] as Iso2768LinearClass } : {}),
      ...(match[2] ? { geometricClass: match[2] as Iso2768GeometricClass } : {}),
      envelope: match[3] === 'E',
    },
  };
}
