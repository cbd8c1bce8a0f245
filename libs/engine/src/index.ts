export * from './core/engine-error.js';
export * from './core/method.js';
export * from './core/units.js';
export * from './core/judge-acceptance.js';
export * from './registry.js';
export * from './stack/index.js';
export * from './formula/index.js';
export * from './in-house/index.js';
