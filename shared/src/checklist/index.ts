export * from './types.js';
export * from './build-checklist.js';
export * from './chamber-code.js';
export * from './fixtures.js';
export { checklistWords, fillTemplate, formatMeasure, formatNumber, type ChecklistWords } from './words.js';
