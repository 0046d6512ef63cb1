export * from './nongravModels.js';
export * from './incompleteGamma.js';
export * from './tailFunctions.js';
