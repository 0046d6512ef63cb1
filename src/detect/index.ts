export * from './types.js';
export * from './empiricalTail.js';
export * from './tisserand.js';
export * from './registry.js';
