// The numbers area's surface: spoken numbers read (interpreter, narration) and said back (read-back).
export { findNumbers, type NumberForm, type NumberOptions, type NumberSpan } from './parse-number.js';
export { measurementToWords } from './measurement-to-words.js';
export { toCommonFraction } from './number-to-words.js';
