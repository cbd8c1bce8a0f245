/**
 * Nominal size steps of ISO 286-1:2010 Table 1 (main ranges) and Tables 2–3 (intermediate steps),
 * as upper bounds in mm: a step is "over the previous bound up to and including this one".
 */
export const mainStepUpperBounds = [
  3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150,
] as const;

/** The rows of the fundamental deviation tables: the main ranges split where ISO 286-1 splits them. */
export const intermediateStepUpperBounds = [
  3, 6, 10, 14, 18, 24, 30, 40, 50, 65, 80, 100, 120, 140, 160, 180, 200, 225, 250, 280, 315, 355, 400, 450, 500,
  560, 630, 710, 800, 900, 1000, 1120, 1250, 1400, 1600, 1800, 2000, 2240, 2500, 2800, 3150,
] as const;

export const largestNominalSizeMm = 3150;
