export * from './renderChart.js';
export * from './writeChartFiles.js';
export * from './palette.js';
export * from './decimate.js';
export * from './resonantAngleChart.js';
export * from './rotatingFrameChart.js';
export * from './scatterMapChart.js';
