export * from './gravity.js';
export * from './relativity.js';
export * from './nonGravLaw.js';
export * from './nonGrav.js';
export * from './radiationPressure.js';
export * from './forceModel.js';
