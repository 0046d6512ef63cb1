export * from './types.js';
export * from './bodySelection.js';
export * from './comparisonSet.js';
export * from './modelFits.js';
export * from './checkGuards.js';
export * from './checkPlausibility.js';
export * from './checkVerdict.js';
export * from './runCheck.js';
