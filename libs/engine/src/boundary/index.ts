export { featureBoundaryMethod, type FeatureBoundaryOutputs } from './feature-boundary-method.js';
export { featureBoundaries, type FeatureBoundaries } from './feature-boundaries.js';
export { materialConditionSizes, type MaterialConditionSizes } from './material-condition-sizes.js';
export { bonusTolerance } from './bonus-tolerance.js';
export { bonusTable, type BonusRow } from './bonus-table.js';
export { sizeSeries } from './size-series.js';
