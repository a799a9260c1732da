// What the narration scorer takes and returns.
import type { Locale } from '../checklist/index.js';

// One stretch of recognised speech: lower case, no punctuation, with the recogniser's errors.
export interface NarrationSegment {
  text: string;
  startMs: number;
  endMs: number;
}

// named: the student said what the item is and, where the checklist has the same check at several
// places, which one. partly: said what it is but not where (or only part of a compound item).
export type NarrationStatus = 'named' | 'partly' | 'missed';

export interface NarratedItem {
  itemKey: string;
  zone: string;
  status: NarrationStatus;
  // When the item first earned its status (ms from the start of the recording); null when missed.
  firstNamedMs: number | null;
  // The segment that earned it, for a trainer reading along with the audio.
  heardIn: string | null;
  // Which of the item's points the student said near a mention of the item.
  pointsHeard: string[];
  pointsMissed: string[];
}

export interface CoverageCounts {
  itemCount: number;
  named: number;
  partly: number;
  missed: number;
  // named / itemCount.
  namedFraction: number;
  // (named + half of partly) / itemCount.
  creditFraction: number;
}

export interface ZoneCoverage extends CoverageCounts {
  zone: string;
  title: string;
}

// An item first named after the student had already named an item of a later zone on the route.
export interface OutOfOrderItem {
  itemKey: string;
  zone: string;
  firstNamedMs: number;
  // The latest zone in route order named before this item, and the first item named from it.
  afterZone: string;
  afterItemKey: string;
}

export interface NarrationScore {
  locale: Locale;
  items: NarratedItem[];
  zones: ZoneCoverage[];
  overall: CoverageCounts;
  outOfOrder: OutOfOrderItem[];
}
