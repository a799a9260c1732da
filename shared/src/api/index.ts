export * from './api.js';
export * from './inspections.js';
export * from './fleet.js';
export * from './training.js';
export * from './client-times.js';
export * from './time-zone.js';
