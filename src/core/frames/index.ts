export * from './frames.js';
export * from './earthRotation.js';
export * from './precession.js';
export * from './observer.js';
