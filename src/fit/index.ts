export * from './types.js';
export * from './frameBias.js';
export * from './geodeticSite.js';
export * from './observerPosition.js';
export * from './observerPlace.js';
export * from './astrometricPlace.js';
