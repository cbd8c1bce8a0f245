import type { WallGeometry } from './wall-geometry.js';

/** Wall along the line of centres with the feature axis at basic distance + offset from the datum. */
export function wallAtOffset(geometry: WallGeometry, featureSize: number, datumSize: number, offset: number): number {
  const centreDistance = geometry.basicDistance + offset;
  if (geometry.kind === 'between') return centreDistance - featureSize / 2 - datumSize / 2;
  const [outerSize, innerSize] = geometry.outer === 'datum' ? [datumSize, featureSize] : [featureSize, datumSize];
  return outerSize / 2 - innerSize / 2 - centreDistance;
}
