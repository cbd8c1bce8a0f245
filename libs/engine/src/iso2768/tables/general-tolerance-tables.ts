// ISO 2768-1:1989 and ISO 2768-2:1989 general tolerances, held in whole micrometres (lengths) and
// arc minutes (angles) so lookups are exact.
// Sources: linear (Table 1), radii/chamfers (Table 2) and angles (Table 3) of ISO 2768-1 as reproduced
// in several engineering references that agree with each other and with memory (team reference
// sheet §3, tagged C), except the class v angle above 400 mm (from memory). ISO 2768-2 Tables 1, 2 and 4
// (straightness/flatness, perpendicularity, circular run-out) likewise [C]; Table 3 (symmetry) from
// memory [M]. Not used: reproductions of a different national table with c = ±0.15/±0.2 in the
// first ranges, and invented "mK" combination tables.

import { type Iso2768GeometricClass, type Iso2768LinearClass } from '@limitbook/contracts';

export interface GeneralToleranceRow<TClass extends string> {
  /** The row holds lengths above `over` (from `over` inclusive in the first row where `firstIncludesOver`)… */
  over: number;
  /** …up to and including `upTo` (mm); null: no upper bound. */
  upTo: number | null;
  values: Record<TClass, number | null>;
}

export interface GeneralToleranceTable<TClass extends string> {
  /** The first row starts at its `over` inclusive ("0.5 up to 3"). */
  firstIncludesOver: boolean;
  rows: readonly GeneralToleranceRow<TClass>[];
}

const linearRow = (over: number, upTo: number | null, f: number | null, m: number, c: number, v: number | null): GeneralToleranceRow<Iso2768LinearClass> => ({
  over, upTo, values: { f, m, c, v },
});
const geometricRow = (over: number, upTo: number | null, H: number, K: number, L: number): GeneralToleranceRow<Iso2768GeometricClass> => ({
  over, upTo, values: { H, K, L },
});

/** ISO 2768-1 Table 1, permissible deviations ± in µm. */
export const linearDeviations: GeneralToleranceTable<Iso2768LinearClass> = {
  firstIncludesOver: true,
  rows: [
    linearRow(0.5, 3, 50, 100, 200, null),
    linearRow(3, 6, 50, 100, 300, 500),
    linearRow(6, 30, 100, 200, 500, 1000),
    linearRow(30, 120, 150, 300, 800, 1500),
    linearRow(120, 400, 200, 500, 1200, 2500),
    linearRow(400, 1000, 300, 800, 2000, 4000),
    linearRow(1000, 2000, 500, 1200, 3000, 6000),
    linearRow(2000, 4000, null, 2000, 4000, 8000),
  ],
};

/** ISO 2768-1 Table 2, external radii and chamfer heights, ± in µm. */
export const radiusChamferDeviations: GeneralToleranceTable<Iso2768LinearClass> = {
  firstIncludesOver: true,
  rows: [linearRow(0.5, 3, 200, 200, 400, 400), linearRow(3, 6, 500, 500, 1000, 1000), linearRow(6, null, 1000, 1000, 2000, 2000)],
};

/** ISO 2768-1 Table 3, angular deviations ± in arc minutes, by the length of the shorter leg. */
export const angularDeviations: GeneralToleranceTable<Iso2768LinearClass> = {
  firstIncludesOver: false,
  rows: [
    linearRow(0, 10, 60, 60, 90, 180),
    linearRow(10, 50, 30, 30, 60, 120),
    linearRow(50, 120, 20, 20, 30, 60),
    linearRow(120, 400, 10, 10, 15, 30),
    linearRow(400, null, 5, 5, 10, 20),
  ],
};

/** ISO 2768-2 Table 1, straightness and flatness in µm, by nominal length. */
export const straightnessFlatnessTolerances: GeneralToleranceTable<Iso2768GeometricClass> = {
  firstIncludesOver: false,
  rows: [
    geometricRow(0, 10, 20, 50, 100),
    geometricRow(10, 30, 50, 100, 200),
    geometricRow(30, 100, 100, 200, 400),
    geometricRow(100, 300, 200, 400, 800),
    geometricRow(300, 1000, 300, 600, 1200),
    geometricRow(1000, 3000, 400, 800, 1600),
  ],
};

/** ISO 2768-2 Table 2, perpendicularity in µm, by the shorter side. */
export const perpendicularityTolerances: GeneralToleranceTable<Iso2768GeometricClass> = {
  firstIncludesOver: false,
  rows: [geometricRow(0, 100, 200, 400, 600), geometricRow(100, 300, 300, 600, 1000), geometricRow(300, 1000, 400, 800, 1500), geometricRow(1000, 3000, 500, 1000, 2000)],
};

/** ISO 2768-2 Table 3, symmetry in µm, by the longer feature [from memory]. */
export const symmetryTolerances: GeneralToleranceTable<Iso2768GeometricClass> = {
  firstIncludesOver: false,
  rows: [geometricRow(0, 100, 500, 600, 600), geometricRow(100, 300, 500, 600, 1000), geometricRow(300, 1000, 500, 800, 1500), geometricRow(1000, 3000, 500, 1000, 2000)],
};

/** ISO 2768-2 Table 4, circular run-out in µm (no length dependence). */
export const circularRunOutTolerances: Record<Iso2768GeometricClass, number> = { H: 100, K: 200, L: 500 };
