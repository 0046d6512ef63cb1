export * from './leapSeconds.js';
export * from './timeScales.js';
export * from './isoTime.js';
export * from './time.js';
export * from './readerEpochs.js';
