import type { FeatureType } from '@limitbook/contracts';

export interface MaterialConditionSizes {
  /** Size with the most material: smallest hole, largest pin. */
  mmcSize: number;
  /** Size with the least material: largest hole, smallest pin. */
  lmcSize: number;
}

export function materialConditionSizes(featureType: FeatureType, lowerLimit: number, upperLimit: number): MaterialConditionSizes {
  return featureType === 'internal'
    ? { mmcSize: lowerLimit, lmcSize: upperLimit }
    : { mmcSize: upperLimit, lmcSize: lowerLimit };
}
