export * from './vehicle/index.js';
export * from './units/index.js';
export * from './checklist/index.js';
export * from './api/index.js';
