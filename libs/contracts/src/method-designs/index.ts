export * from './method-designs.js';
