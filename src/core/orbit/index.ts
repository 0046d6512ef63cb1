export * from './stumpff.js';
export * from './kepler.js';
export * from './anomaly.js';
export * from './universal.js';
export * from './twoBody.js';
export * from './stateToElements.js';
