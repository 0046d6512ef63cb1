export * from './chebyshev.js';
export * from './chebyshevAlgebra.js';
export * from './besselJ.js';
export * from './poissonSeries.js';
export * from './poissonChebyshev.js';
