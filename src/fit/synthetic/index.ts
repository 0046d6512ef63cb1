export * from './types.js';
export * from './visibility.js';
export * from './truthTrajectory.js';
export * from './candidateNights.js';
export * from './tracklets.js';
export * from './generateSyntheticAstrometry.js';
