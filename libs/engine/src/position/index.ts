export { positionCheckMethod, type PositionCheckOutputs, type PositionRow } from './position-check-method.js';
export { featurePosition, type FeaturePosition, type MeasuredFeature } from './feature-position.js';
export { groupTranslation, type Disc, type GroupTranslation } from './group-translation.js';
