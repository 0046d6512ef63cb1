export * from './types.js';
export * from './averagedDisturbing.js';
export * from './periodicGrid.js';
export * from './potentialWells.js';
export * from './phasePortrait.js';
export * from './librationPeriod.js';
export * from './predictCoorbital.js';
