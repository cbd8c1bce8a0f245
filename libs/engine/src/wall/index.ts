export { wallThicknessMethod, type WallThicknessOutputs } from './wall-thickness-method.js';
export { wallGeometry, type WallGeometry } from './wall-geometry.js';
export { wallAtSizes, type WallAtSizes, type WallModel } from './wall-at-sizes.js';
export { wallAtOffset } from './wall-at-offset.js';
export { wallExtremes, type WallExtremes, type WallSweep } from './wall-extremes.js';
export { datumFeatureShift } from './datum-feature-shift.js';
