import type { DatumFeatureType, FeatureType, WallArrangement } from '@limitbook/contracts';
import { EngineError } from '../core/engine-error.js';

/**
 * Which wall lies between the two surfaces along the line of centres.
 * - `between`: two internal features side by side (or a hole beside a plane datum); the wall is
 *   the material between them: w = c − r_f − r_d.
 * - `inside`: one internal feature inside one external feature (coaxial, or off-centre at a basic
 *   distance); the wall is the external feature's material beside the internal one: w = R − r − c.
 * c is the centre distance (L + δ), δ the located feature's offset along the line of centres.
 */
export type WallGeometry =
  | { kind: 'between'; basicDistance: number; datumIsPlane: boolean }
  | { kind: 'inside'; basicDistance: number; outer: 'feature' | 'datum' };

export function wallGeometry(
  arrangement: WallArrangement,
  featureType: FeatureType,
  datumType: DatumFeatureType,
  basicDistance: number | null | undefined,
): WallGeometry {
  if (arrangement === 'coaxial') {
    if (datumType === 'plane') {
      throw EngineError.invalid({ 'datum.featureType': 'A plane datum has no axis: use the side-by-side arrangement with the basic distance from the plane' });
    }
    if (featureType === datumType) {
      throw EngineError.invalid({
        'feature.featureType': `Two coaxial ${featureType} features leave no wall between them: a wall needs one internal feature inside one external feature (a bore in a boss)`,
      });
    }
    return { kind: 'inside', basicDistance: 0, outer: featureType === 'external' ? 'feature' : 'datum' };
  }
  const distance = basicDistance ?? 0;
  if (datumType === 'plane') {
    if (featureType === 'external') {
      throw EngineError.invalid({ 'feature.featureType': 'An external feature beside a plane datum has no wall between them: locate an internal feature (a hole near an edge face)' });
    }
    return { kind: 'between', basicDistance: distance, datumIsPlane: true };
  }
  if (featureType === 'internal' && datumType === 'internal') return { kind: 'between', basicDistance: distance, datumIsPlane: false };
  if (featureType === 'external' && datumType === 'external') {
    throw EngineError.invalid({ 'feature.featureType': 'Two external features side by side have a gap between them, not a wall: a wall needs an internal feature' });
  }
  return { kind: 'inside', basicDistance: distance, outer: featureType === 'external' ? 'feature' : 'datum' };
}
