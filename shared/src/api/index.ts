export * from './api.js';
export * from './inspections.js';
