// The review area's surface: the route walked, the rushed flag, recurring defects and the day of use.
export type { CurrentDefect, EarlierDefect, RecurringDefect, ReviewFlags, ZoneVisit } from './types.js';
export { walkedRoute } from './timeline.js';
export { RECURRING_RULE, findRecurringDefects } from './recurring.js';
export { rushedFlag } from './rushed-flag.js';
export { dayOfUse } from './day-of-use.js';
