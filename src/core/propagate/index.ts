export * from './propagateTestBodies.js';
export * from './propagateOrbit.js';
