export * from './nongravModels.js';
export * from './incompleteGamma.js';
export * from './tailFunctions.js';
export * from './informationCriteria.js';
export * from './modelComparison.js';
export * from './stationMeans.js';
export * from './runsTest.js';
export * from './leaveOneStationOut.js';
