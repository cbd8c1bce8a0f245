// Fixtures for other packages' tests; not part of the runtime API.
export { harmlessErrorFormulaExpressions, refusedFormulaExpressions } from './formula/hostile-expressions.js';
