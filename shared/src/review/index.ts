export * from './types.js';
export * from './timeline.js';
export { RECURRING_RULE, findRecurringDefects, type RecurringRule } from './recurring.js';
export * from './rushed-flag.js';
export * from './day-of-use.js';
