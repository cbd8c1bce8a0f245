export { fastenerFloatingMethod, type FastenerFloatingOutputs } from './fastener-floating-method.js';
export { fastenerFixedMethod, type FastenerFixedOutputs } from './fastener-fixed-method.js';
export { solveFloating, type FloatingSolution } from './solve-floating.js';
export { solveFixed, type FixedSolution } from './solve-fixed.js';
