export * from './normalise-text.js';
export * from './number-words.js';
export * from './parse-number.js';
export * from './number-to-words.js';
