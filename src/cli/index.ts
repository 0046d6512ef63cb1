export * from './scan.js';
export * from './loadCatalogue.js';
export * from './optionParsers.js';
export * from './program.js';
export * from './propagate.js';
