// Which defects a fix on the spot needs a new reading for. A file of its own, so the phone's voice
// loop can ask it without loading the whole report summary.
import type { ItemResult } from '../checklist/index.js';

// A value found out of limit is fixed only by a new value within it ("added air, now one ten"); a
// defect the driver described (a bulb out, a loose cap) is fixed on their word.
export function fixNeedsReading(result: Pick<ItemResult, 'verdict'>): boolean {
  return result.verdict === 'out_of_limit';
}
