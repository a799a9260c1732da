export * from './vehicle/index.js';
export * from './units/index.js';
export * from './checklist/index.js';
// Text and numbers serve the interpreter and narration; the apps need only the normaliser, and a
// value with its unit in words (the voice loop puts it in sentences of its own).
export { normaliseText, type NormalisedText } from './text/index.js';
export { measurementToWords } from './numbers/index.js';
export * from './interpreter/index.js';
export * from './limits/index.js';
export * from './api/index.js';
export * from './narration/index.js';
export * from './summary/index.js';
export * from './review/index.js';
export * from './records/index.js';
