export { iso286FitMethod, type Iso286FitOutputs, type Iso286Side, type Iso286SizeRange } from './iso286-fit.method.js';
export { holeLimitDeviations } from './hole-limit-deviations.js';
export { shaftLimitDeviations } from './shaft-limit-deviations.js';
export { parseToleranceClass } from './parse-tolerance-class.js';
export { classifyFit, type FitType } from './classify-fit.js';
export { standardTolerance } from './standard-tolerance.js';
