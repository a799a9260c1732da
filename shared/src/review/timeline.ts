// The route of a walk-around as walked: zones in the order the answers came, with their time.
import type { Checklist, ItemResult } from '../checklist/index.js';
import type { ZoneVisit } from './types.js';

export interface TimelineOptions {
  // ISO time the walk-around started; the first answer is credited the time since then.
  startedAt?: string;
}

// Answers without a readable time and answers to items not on the checklist are left out. The
// latest answer of an item stands, as in the report summary.
export function walkedRoute(
  checklist: Checklist,
  results: readonly ItemResult[],
  options: TimelineOptions = {},
): ZoneVisit[] {
  const zoneOf = new Map(checklist.items.map((item) => [item.key, item.zone]));
  const titles = new Map(checklist.zones.map((zone) => [zone.key, zone.title]));
  const latest = new Map<string, { at: number; iso: string }>();
  for (const result of results) {
    const at = Date.parse(result.answeredAt);
    if (!Number.isFinite(at) || !zoneOf.has(result.itemKey)) continue;
    const previous = latest.get(result.itemKey);
    if (!previous || at >= previous.at) latest.set(result.itemKey, { at, iso: result.answeredAt });
  }
  const order = new Map(checklist.items.map((item, index) => [item.key, index]));
  // Same moment: checklist order.
  const timed = [...latest.entries()]
    .map(([key, time]) => ({ key, zone: zoneOf.get(key) as string, ...time }))
    .sort((a, b) => a.at - b.at || (order.get(a.key) ?? 0) - (order.get(b.key) ?? 0));

  const startMs = options.startedAt !== undefined ? Date.parse(options.startedAt) : NaN;
  let previousMs = Number.isFinite(startMs) ? startMs : null;
  const visits: ZoneVisit[] = [];
  const creditedMs: number[] = [];
  for (const entry of timed) {
    const gap = previousMs === null ? 0 : Math.max(0, entry.at - previousMs);
    previousMs = entry.at;
    const current = visits[visits.length - 1];
    if (current && current.zone === entry.zone) {
      current.lastAnsweredAt = entry.iso;
      current.answerCount += 1;
      creditedMs[creditedMs.length - 1]! += gap;
      continue;
    }
    visits.push({
      zone: entry.zone,
      title: titles.get(entry.zone) ?? entry.zone,
      firstAnsweredAt: entry.iso,
      lastAnsweredAt: entry.iso,
      seconds: 0,
      answerCount: 1,
    });
    creditedMs.push(gap);
  }
  visits.forEach((visit, index) => {
    visit.seconds = Math.round((creditedMs[index] ?? 0) / 1000);
  });
  return visits;
}
