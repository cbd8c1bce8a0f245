/** A disc of the plane: centre and radius. */
export interface Disc {
  x: number;
  y: number;
  r: number;
}

const maxAveragedCorners = 256;

export type GroupTranslation = { feasible: true; x: number; y: number } | { feasible: false };

function inside(x: number, y: number, disc: Disc, epsilon: number): boolean {
  return Math.hypot(x - disc.x, y - disc.y) <= disc.r + epsilon;
}

/** The points where two circles meet: none, one (tangent, within epsilon) or two. */
function circleIntersections(a: Disc, b: Disc, epsilon: number): [number, number][] {
  const d = Math.hypot(b.x - a.x, b.y - a.y);
  if (d > a.r + b.r + epsilon || d < Math.abs(a.r - b.r) - epsilon || d === 0) return [];
  const along = (d * d + a.r * a.r - b.r * b.r) / (2 * d);
  const half = Math.sqrt(Math.max(0, a.r * a.r - along * along));
  const ux = (b.x - a.x) / d;
  const uy = (b.y - a.y) / d;
  const mx = a.x + along * ux;
  const my = a.y + along * uy;
  return half === 0 ? [[mx, my]] : [
    [mx - half * uy, my + half * ux],
    [mx + half * uy, my - half * ux],
  ];
}

/**
 * Whether the discs have a common point, solved exactly: if the intersection is not empty, its
 * left-most point is the left-most point of one disc or a point where two circles cross, so
 * those candidates decide it. The answer returned is the mean of every candidate that lies in
 * all discs, which lies inside the (convex) intersection rather than on its edge.
 * `epsilon` is the length below which two points count as one (scaled to the data by the caller).
 */
export function groupTranslation(discs: readonly Disc[], epsilon: number): GroupTranslation {
  if (discs.length === 0) return { feasible: true, x: 0, y: 0 };
  // Tightest discs first: a candidate outside the intersection is usually rejected by the first test.
  const ordered = [...discs].sort((a, b) => a.r - b.r);
  const candidates: [number, number][] = ordered.map((disc) => [disc.x - disc.r, disc.y]);
  for (let i = 0; i < ordered.length; i += 1) {
    for (let j = i + 1; j < ordered.length; j += 1) candidates.push(...circleIntersections(ordered[i]!, ordered[j]!, epsilon));
  }
  let count = 0;
  let sumX = 0;
  let sumY = 0;
  // The common point lies in every disc's bounding box, so in their intersection: a cheap first test.
  const box = {
    left: Math.max(...ordered.map((disc) => disc.x - disc.r)) - epsilon,
    right: Math.min(...ordered.map((disc) => disc.x + disc.r)) + epsilon,
    bottom: Math.max(...ordered.map((disc) => disc.y - disc.r)) - epsilon,
    top: Math.min(...ordered.map((disc) => disc.y + disc.r)) + epsilon,
  };
  if (box.left > box.right || box.bottom > box.top) return { feasible: false };
  // The disc that last rejected a candidate is tried first: neighbouring candidates usually fail on the same one.
  let rejector = 0;
  for (const [x, y] of candidates) {
    if (x < box.left || x > box.right || y < box.bottom || y > box.top || !inside(x, y, ordered[rejector]!, epsilon)) continue;
    const failed = ordered.findIndex((disc) => !inside(x, y, disc, epsilon));
    if (failed !== -1) {
      rejector = failed;
      continue;
    }
    count += 1;
    sumX += x;
    sumY += y;
    // Enough corners to place the mean well inside; the rest would only cost time on large patterns.
    if (count === maxAveragedCorners) break;
  }
  return count === 0 ? { feasible: false } : { feasible: true, x: sumX / count, y: sumY / count };
}
