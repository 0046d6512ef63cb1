export * from './types.js';
export * from './thresholds.js';
export * from './uncertaintyParameter.js';
export * from './validate.js';
export * from './derivedElements.js';
export * from './qualityFlags.js';
export * from './catalogueBuilder.js';
export * from './slotIndex.js';
