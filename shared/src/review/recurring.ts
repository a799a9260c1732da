// A defect that comes back: the same item on the same vehicle was reported before.
import type { CurrentDefect, EarlierDefect, RecurringDefect } from './types.js';

// Our own product choice, no published source: a defect reported again within 90 days of the last
// report or certification of the same item on the same vehicle (about one quarter, the span of the
// three-month record retention in 49 CFR 396.11(a)(4)) is worth a supervisor's look; a defect still
// open or only deferred counts whenever it was reported.
export interface RecurringRule {
  windowDays: number;
}

export const RECURRING_RULE: RecurringRule = { windowDays: 90 };

const DAY_MS = 24 * 60 * 60 * 1000;

// Item keys start with the unit's place in the combination ("u1.axle2..."): a trailer pulled
// behind another tractor keeps its items, so compare without it.
export function itemKeyOnUnit(itemKey: string): string {
  return itemKey.replace(/^u\d+\./, '');
}

// `earlier` are defects of earlier reports (any vehicle or item; the rest are ignored); `at` is when
// the current report was prepared.
export function findRecurringDefects(
  current: readonly CurrentDefect[],
  earlier: readonly EarlierDefect[],
  at: string,
  rule: Partial<RecurringRule> = {},
): RecurringDefect[] {
  const { windowDays } = { ...RECURRING_RULE, ...rule };
  const atMs = Date.parse(at);
  const windowStart = atMs - windowDays * DAY_MS;
  const found: RecurringDefect[] = [];
  for (const defect of current) {
    const key = itemKeyOnUnit(defect.itemKey);
    const matches = earlier.filter((e) => {
      if (e.vehicleId !== defect.vehicleId || itemKeyOnUnit(e.itemKey) !== key) return false;
      const reportedMs = Date.parse(e.reportedAt);
      if (!(reportedMs < atMs)) return false;
      if (e.state === 'open' || e.state === 'deferred') return true;
      const lastMs = Math.max(reportedMs, e.certifiedAt !== null ? Date.parse(e.certifiedAt) : reportedMs);
      return lastMs >= windowStart;
    });
    if (matches.length === 0) continue;
    const latest = matches.reduce((a, b) => (Date.parse(b.reportedAt) > Date.parse(a.reportedAt) ? b : a));
    found.push({ ...defect, earlier: latest, earlierCount: matches.length });
  }
  return found;
}
