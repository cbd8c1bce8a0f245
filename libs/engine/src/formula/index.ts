export * from './describe-quantity.js';
export * from './evaluate-formula-set.js';
export * from './formula-allow-list.js';
export * from './formula.method.js';
export { disabledFunctionNames } from './sandboxed-math.js';
