// j shafts and J holes do not follow the general rule: ISO 286-1:2010 Tables 2 and 3 give their
// fundamental deviation per grade, and only for the grades below (j5–j8, J6–J8), up to 500 mm.
// Source: the ISO 286 Rust crate's reproduction of those columns; it agrees with memory of the
// ISO 286-2 j5–j8 and J6–J8 tables (j6 at 0–3 mm +4/−2, J7 at 18–30 mm +12/−9): treat as from memory.

const _ = null;

/** Row: [upper bound of the main range in mm, ei of j5, j6, j7, j8], µm. */
export const jShaftLowerDeviationRows: readonly (readonly [number, ...(number | null)[]])[] = [
  //    j5   j6   j7   j8
  [3,   -2,  -2,  -4,  -6],
  [6,   -2,  -2,  -4,  _],
  [10,  -2,  -2,  -5,  _],
  [18,  -3,  -3,  -6,  _],
  [30,  -4,  -4,  -8,  _],
  [50,  -5,  -5,  -10, _],
  [80,  -7,  -7,  -12, _],
  [120, -9,  -9,  -15, _],
  [180, -11, -11, -18, _],
  [250, -13, -13, -21, _],
  [315, -16, -16, -26, _],
  [400, -18, -18, -28, _],
  [500, -20, -20, -32, _],
];
export const jShaftGrades = [5, 6, 7, 8] as const;

/** Row: [upper bound of the main range in mm, ES of J6, J7, J8], µm. */
export const jHoleUpperDeviationRows: readonly (readonly [number, ...(number | null)[]])[] = [
  //    J6  J7  J8
  [3,   2,  4,  6],
  [6,   5,  6,  10],
  [10,  5,  8,  12],
  [18,  6,  10, 15],
  [30,  8,  12, 20],
  [50,  10, 14, 24],
  [80,  13, 18, 28],
  [120, 16, 22, 34],
  [180, 18, 26, 41],
  [250, 22, 30, 47],
  [315, 25, 36, 55],
  [400, 29, 39, 60],
  [500, 33, 43, 66],
];
export const jHoleGrades = [6, 7, 8] as const;
