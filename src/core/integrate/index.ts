export * from './gaussRadauSpacings.js';
export * from './gaussRadau.js';
