// Δ for the hole rule ES = −ei + Δ (K, M, N up to IT8; P–ZC up to IT7), µm, ISO 286-1:2010 Table 3.
// Sources: the two open-source ISO/DIN ISO 286 reproductions agree on every cell; every cell is also
// IT(n) − IT(n−1) of the grade table (checked in the spec). Above 500 mm the standard applies no Δ.

/** Row: [upper bound of the main range in mm, Δ for IT3, IT4, IT5, IT6, IT7, IT8]. */
export const deltaRows: readonly (readonly [number, number, number, number, number, number, number])[] = [
  //    IT3  IT4  IT5  IT6  IT7  IT8
  [3,   0,   0,   0,   0,   0,   0],
  [6,   1,   1.5, 1,   3,   4,   6],
  [10,  1,   1.5, 2,   3,   6,   7],
  [18,  1,   2,   3,   3,   7,   9],
  [30,  1.5, 2,   3,   4,   8,   12],
  [50,  1.5, 3,   4,   5,   9,   14],
  [80,  2,   3,   5,   6,   11,  16],
  [120, 2,   4,   5,   7,   13,  19],
  [180, 3,   4,   6,   7,   15,  23],
  [250, 3,   4,   6,   9,   17,  26],
  [315, 4,   4,   7,   9,   20,  29],
  [400, 4,   5,   7,   11,  21,  32],
  [500, 5,   5,   7,   13,  23,  34],
];
export const deltaGrades = [3, 4, 5, 6, 7, 8] as const;
