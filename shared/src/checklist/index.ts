export * from './types.js';
export * from './build-checklist.js';
export { isReadingRequired } from './required-readings.js';
export { checklistWords, type ChecklistWords } from './words.js';
export { fillTemplate, formatMeasure, formatNumber, verdictWords, type VerdictWords } from './measure-words.js';
