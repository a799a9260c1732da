export * from './types.js';
export * from './build-checklist.js';
// The apps' tests take these from @yardcall/shared/testing; this line goes once the walk-around's tests do too.
export * from './fixtures.js';
export { isReadingRequired } from './required-readings.js';
export { checklistWords, type ChecklistWords } from './words.js';
export { fillTemplate, formatMeasure, formatNumber, verdictWords, type VerdictWords } from './measure-words.js';
