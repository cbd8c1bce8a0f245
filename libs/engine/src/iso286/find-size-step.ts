export interface SizeStep {
  /** The step holds sizes above `over` … */
  over: number;
  /** … up to and including `upTo` (mm). */
  upTo: number;
  index: number;
}

/**
 * The step of an ISO size table that holds `sizeMm`. Steps are "over a up to and including b",
 * so a size on a bound belongs to the lower step (10 mm is in 6–10). Undefined outside the table.
 */
export function findSizeStep(sizeMm: number, upperBounds: readonly number[]): SizeStep | undefined {
  if (!(sizeMm > 0)) return undefined;
  const index = upperBounds.findIndex((upTo) => sizeMm <= upTo);
  if (index < 0) return undefined;
  return { over: index === 0 ? 0 : (upperBounds[index - 1] as number), upTo: upperBounds[index] as number, index };
}
