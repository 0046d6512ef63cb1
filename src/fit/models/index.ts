export * from './incompleteGamma.js';
export * from './tailFunctions.js';
