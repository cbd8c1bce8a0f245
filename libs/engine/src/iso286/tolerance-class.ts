import { type GradeName } from './tables/standard-tolerance-grades.js';

export type FeatureSide = 'hole' | 'shaft';

/** A parsed ISO 286 tolerance class such as H7 (hole, capital letters) or js6 (shaft, lower case). */
export interface ToleranceClass {
  side: FeatureSide;
  /** The fundamental deviation letter(s) as written: "H", "JS", "zc". */
  letter: string;
  grade: GradeName;
  designation: string;
}

/** Grade order for comparisons: IT01 → −1, IT0 → 0, IT1 → 1 … IT18 → 18. */
export function gradeRank(grade: GradeName): number {
  return grade === '01' ? -1 : Number(grade);
}
