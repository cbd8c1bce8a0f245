/** Functions a formula may call: scalar mathematics with units, nothing that builds matrices, parses or reaches outside. */
export const allowedFunctions: ReadonlySet<string> = new Set([
  'abs', 'sqrt', 'cbrt', 'nthRoot', 'square', 'cube', 'exp', 'log', 'log10', 'log2', 'pow', 'hypot',
  'sin', 'cos', 'tan', 'asin', 'acos', 'atan', 'atan2', 'sinh', 'cosh', 'tanh',
  'min', 'max', 'floor', 'ceil', 'round', 'fix', 'sign', 'mod', 'to', 'number',
]);

/** Operators by their mathjs function name: arithmetic, unit conversion (`to`/`in`), comparison and logic. */
export const allowedOperators: ReadonlySet<string> = new Set([
  'add', 'subtract', 'multiply', 'divide', 'pow', 'unaryMinus', 'unaryPlus', 'mod', 'to',
  'smaller', 'larger', 'smallerEq', 'largerEq', 'equal', 'unequal', 'and', 'or', 'not', 'xor',
]);

export const allowedConstants: ReadonlySet<string> = new Set(['pi', 'e', 'tau']);

/** Words the mathjs parser treats as operators or literals, which cannot be names. */
export const parserKeywords: ReadonlySet<string> = new Set(['to', 'in', 'and', 'or', 'not', 'xor', 'mod', 'true', 'false', 'null', 'undefined', 'end']);
