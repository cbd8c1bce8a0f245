export * from './analyse-stack.js';
export * from './normal-tail-probability.js';
export * from './random-stream.js';
export * from './run-monte-carlo.js';
export * from './stack-1d.method.js';
export * from './stack-capability.js';
export * from './stack-closed-forms.js';
export * from './stack-plan.js';
