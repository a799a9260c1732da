// The supervisor's day: which units had a pre-trip today and which were used without one. "Used" is
// what the records show: a post-trip or en-route inspection of the unit today. A unit driven with no
// inspection at all leaves no record here, so it cannot be seen. Our own rule (49 CFR 396.13 asks the
// driver to be satisfied the vehicle is in safe condition before driving; it sets no form).
import type { InspectionKind } from '../checklist/index.js';

export interface DayInspection {
  id: string;
  kind: InspectionKind;
  startedAt: string;
}

export interface DayOfUse<T extends DayInspection> {
  // The day's first pre-trip of the unit.
  preTrip: T | null;
  // The day's first post-trip or en-route inspection that no pre-trip of the day came before.
  usedWithoutPreTrip: T | null;
}

// One unit's inspections of one day (any order); practice walk-arounds count for nothing.
export function dayOfUse<T extends DayInspection>(inspections: readonly T[]): DayOfUse<T> {
  const ordered = [...inspections]
    .filter((i) => i.kind !== 'practice')
    .sort((a, b) => Date.parse(a.startedAt) - Date.parse(b.startedAt));
  const preTrip = ordered.find((i) => i.kind === 'pre_trip') ?? null;
  const preTripMs = preTrip ? Date.parse(preTrip.startedAt) : Number.POSITIVE_INFINITY;
  const usedWithoutPreTrip =
    ordered.find((i) => (i.kind === 'post_trip' || i.kind === 'en_route') && Date.parse(i.startedAt) < preTripMs) ??
    null;
  return { preTrip, usedWithoutPreTrip };
}
