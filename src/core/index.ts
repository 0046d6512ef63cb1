export * from './vsop87Series.js';
export * from './vsop87.js';
export * from './elpMoon.js';
export * from './ephemerisBody.js';
export * from './vsop87Ephemeris.js';
export * from './chebyshev.js';
export * from './ephemerisCache.js';
export * from './ephemeris.js';
