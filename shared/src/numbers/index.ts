export * from './parse-number.js';
export * from './number-to-words.js';
