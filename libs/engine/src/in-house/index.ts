export * from './check-method-design.js';
export * from './describe-method-design.js';
export * from './design-input-schema.js';
export * from './evaluate-method-design.js';
export * from './expression-tex.js';
export * from './quantity-unit.js';
export * from './run-design-task.js';
export * from './run-design-tests.js';
