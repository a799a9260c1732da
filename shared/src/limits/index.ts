export * from './limits-table.js';
export * from './evaluate-measurement.js';
