export * from './fold-text.js';
export * from './stem-word.js';
export * from './number-words.js';
export * from './normalise-text.js';
export * from './to-words.js';
export * from './original-words.js';
