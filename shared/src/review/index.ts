export * from './types.js';
export * from './timeline.js';
export * from './recurring.js';
export * from './rushed-flag.js';
export * from './day-of-use.js';
