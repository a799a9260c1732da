// The report summary of one walk-around: defects, whether the vehicle may be driven, gaps and timing.
import type {
  Checklist,
  ChecklistItem,
  ItemCategory,
  ItemResult,
  MeasurementValue,
  NoReadingReason,
  SpotFix,
  Verdict,
} from '../checklist/index.js';

import { fixNeedsReading } from './spot-fix.js';

export const CERTIFICATION_ACTIONS = ['repaired', 'no_repair_needed', 'deferred'] as const;
export type CertificationAction = (typeof CERTIFICATION_ACTIONS)[number];

// A mechanic's word on one defect. Only a repair or a "no repair needed" clears a defect that blocks
// driving (49 CFR 396.11(a)(3)); a deferral postpones a defect that does not affect safe operation.
export interface RepairCertification {
  itemKey: string;
  action: CertificationAction;
}

export type DefectReason = 'reported' | 'out_of_limit';

// The item a line of the summary is about.
export interface SummaryItemRef {
  itemKey: string;
  zone: string;
  title: string;
  positionLabel: string;
  safety: boolean;
}

// A defect as the driver found it: reported, or a reading out of limit.
export interface FoundDefect extends SummaryItemRef {
  category: ItemCategory;
  // Both when the driver called it a defect and the measurement was out of limit.
  reasons: DefectReason[];
  detail?: string;
  measurement?: MeasurementValue;
  verdict?: Verdict;
  answeredAt: string;
}

export interface SummaryDefect extends FoundDefect {
  // Until certified, a safety defect or an out-of-limit measurement keeps the vehicle parked.
  blocksDriving: boolean;
  certification?: CertificationAction;
  // True when a certification clears it (for a non-blocking defect, a deferral is enough).
  cleared: boolean;
  // A fix the driver tried that did not count: its new reading is still out of limit, or not judged.
  failedFix?: SpotFix;
}

// A defect the driver corrected during the inspection: it stays on the report, opens no shop
// defect and does not keep the vehicle parked.
export interface SpotFixedDefect extends FoundDefect {
  // What the driver did ("added air"), the reading after it where one applies, and when.
  action: string;
  newMeasurement?: MeasurementValue;
  newVerdict?: Verdict;
  fixedAt: string;
  heard?: string;
}

// A measured check passed without a number: checked by eye, by hand or by a thumper ('visual'), or
// a reading the organisation requires that the driver had no gauge for ('no_gauge').
export interface PassedWithoutReading extends SummaryItemRef {
  reason: NoReadingReason;
}

export type UnansweredItem = SummaryItemRef;

export interface ZoneTiming {
  zone: string;
  title: string;
  itemCount: number;
  answeredCount: number;
  firstAnsweredAt?: string;
  lastAnsweredAt?: string;
  // Sum of the gaps that ended in an answer of this zone (see attributeGaps).
  durationMs: number;
}

// Our own practice, not a regulation: no rule sets how long a walk-around takes (49 CFR 395.2 only
// makes it on-duty time); logging about 15 minutes for a tractor and trailer is common practice.
// The walk-around is asked stop by stop (a wheel end, a brake, the rear lamps), and a tractor and a
// 2-axle trailer have about 60 stops, so the common pace is about 15 s a stop. Pace is judged per
// stop, not per item: one answer covers a stop's 1 to 6 items, so an item count would call every
// normal walk-around rushed.
// - minMsPerStop 7.5 s, over the stops with an answer: half the common pace. A practised driver may
//   well be quicker than common, but not twice as quick over a whole walk-around.
// - minMedianGapMs 5 s: the app's short prompt ("Axle 1, left wheel?") takes about 2 s to say and a
//   driver's answer ("all good", or a reading) 1 to 3 s (our own estimates), so a typical gap under
//   5 s leaves about no time to look at the stop.
// - minAnswers 10 answered stops: fewer is too little to judge.
// The flag asks a supervisor to look; it is not a finding against the driver.
export interface RushedRule {
  minMedianGapMs: number;
  minMsPerStop: number;
  // Below this many answered stops there is too little to judge.
  minAnswers: number;
}

export const RUSHED_RULE: RushedRule = { minMedianGapMs: 5000, minMsPerStop: 7500, minAnswers: 10 };

export type RushedReason = 'median_gap' | 'total_duration';

export interface RushedCheck {
  rushed: boolean;
  reasons: RushedReason[];
  medianGapMs: number | null;
  totalDurationMs: number | null;
  // Stops with at least one timed answer: what the pace is judged over.
  answeredStopCount: number;
  // What the whole walk-around should at least have taken for its answered stops.
  minimumDurationMs: number;
  rule: RushedRule;
}

export interface InspectionSummary {
  itemCount: number;
  answeredCount: number;
  // Open defects: reported or out of limit, and not fixed on the spot.
  defects: SummaryDefect[];
  fixedOnTheSpot: SpotFixedDefect[];
  // Measured checks passed without a reading, by eye or by hand, and those with no gauge.
  checkedWithoutReading: PassedWithoutReading[];
  noGauge: PassedWithoutReading[];
  safetyDefectCount: number;
  // Any out-of-limit measurement or safety defect says no until each has a repair or a
  // no-repair-needed certification. The app supports and does not replace the driver's and
  // mechanic's judgement; local rules and the manufacturer's specifications govern.
  mayBeDriven: boolean;
  drivingBlockedBy: string[];
  unanswered: UnansweredItem[];
  unansweredSafetyCount: number;
  zones: ZoneTiming[];
  startedAt?: string;
  finishedAt?: string;
  totalDurationMs: number | null;
  rushed: RushedCheck;
  // Results whose item is not on the checklist: ignored, listed so nothing vanishes silently.
  unknownItemKeys: string[];
}

export interface SummaryOptions {
  // ISO time the walk-around started; without it the first answer's time stands in.
  startedAt?: string;
  certifications?: readonly RepairCertification[];
  rushedRule?: Partial<RushedRule>;
}

interface TimedResult {
  result: ItemResult;
  item: ChecklistItem;
  atMs: number;
}

function parseTime(iso: string): number | null {
  const ms = Date.parse(iso);
  return Number.isFinite(ms) ? ms : null;
}

// When an item was answered more than once (going back), the latest answer stands; on equal
// times the later one in the list.
function latestResults(results: readonly ItemResult[]): Map<string, ItemResult> {
  const latest = new Map<string, ItemResult>();
  for (const result of results) {
    const previous = latest.get(result.itemKey);
    if (!previous) {
      latest.set(result.itemKey, result);
      continue;
    }
    const previousMs = parseTime(previous.answeredAt) ?? -Infinity;
    const currentMs = parseTime(result.answeredAt) ?? -Infinity;
    if (currentMs >= previousMs) latest.set(result.itemKey, result);
  }
  return latest;
}

// The last certification given for an item is its current state.
function certificationsByItem(certifications: readonly RepairCertification[]): Map<string, CertificationAction> {
  const byItem = new Map<string, CertificationAction>();
  for (const certification of certifications) byItem.set(certification.itemKey, certification.action);
  return byItem;
}

function clears(defectBlocksDriving: boolean, action: CertificationAction | undefined): boolean {
  switch (action) {
    case 'repaired':
    case 'no_repair_needed':
      return true;
    case 'deferred':
      return !defectBlocksDriving;
    case undefined:
      return false;
  }
}

function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}

// Each answer is credited with the time since the answer before it (or since the start for the
// first one), so zone times add up to the whole walk-around even when the driver goes back. Items
// of one stop answered together share their time: the gaps are counted between answers, not items.
function attributeGaps(
  timed: readonly TimedResult[],
  startMs: number | null,
): { gapsMs: number[]; byZone: Map<string, number> } {
  const gapsMs: number[] = [];
  const byZone = new Map<string, number>();
  let previous: TimedResult | null = null;
  for (const entry of timed) {
    const sameAnswer =
      previous !== null && previous.atMs === entry.atMs && previous.item.stopKey === entry.item.stopKey;
    const fromMs = previous?.atMs ?? startMs;
    if (fromMs !== null && !sameAnswer) {
      const gap = Math.max(0, entry.atMs - fromMs);
      gapsMs.push(gap);
      byZone.set(entry.item.zone, (byZone.get(entry.item.zone) ?? 0) + gap);
    }
    previous = entry;
  }
  return { gapsMs, byZone };
}

function checkRushed(
  gapsMs: readonly number[],
  totalDurationMs: number | null,
  answeredStopCount: number,
  rule: RushedRule,
): RushedCheck {
  const medianGapMs = median(gapsMs);
  const minimumDurationMs = answeredStopCount * rule.minMsPerStop;
  const reasons: RushedReason[] = [];
  if (answeredStopCount >= rule.minAnswers) {
    if (medianGapMs !== null && medianGapMs < rule.minMedianGapMs) reasons.push('median_gap');
    if (totalDurationMs !== null && totalDurationMs < minimumDurationMs) reasons.push('total_duration');
  }
  return {
    rushed: reasons.length > 0,
    reasons,
    medianGapMs,
    totalDurationMs,
    answeredStopCount,
    minimumDurationMs,
    rule,
  };
}

// A fix counts when its new reading, if it has or needs one, was judged and is not out of limit; a
// new reading without a verdict is not trusted to clear a defect.
function fixCounts(result: ItemResult, fix: SpotFix): boolean {
  if (fix.measurement === undefined) return !fixNeedsReading(result);
  return fix.verdict !== undefined && fix.verdict !== 'out_of_limit';
}

function defectReasons(result: ItemResult): DefectReason[] {
  const reasons: DefectReason[] = [];
  if (result.answer === 'defect') reasons.push('reported');
  if (result.verdict === 'out_of_limit') reasons.push('out_of_limit');
  return reasons;
}

function itemRef(item: ChecklistItem): SummaryItemRef {
  return {
    itemKey: item.key,
    zone: item.zone,
    title: item.title,
    positionLabel: item.positionLabel,
    safety: item.safety,
  };
}

function foundDefect(item: ChecklistItem, result: ItemResult, reasons: DefectReason[]): FoundDefect {
  const found: FoundDefect = { ...itemRef(item), category: item.category, reasons, answeredAt: result.answeredAt };
  if (result.detail !== undefined) found.detail = result.detail;
  if (result.measurement !== undefined) found.measurement = result.measurement;
  if (result.verdict !== undefined) found.verdict = result.verdict;
  return found;
}

function toDefect(
  item: ChecklistItem,
  result: ItemResult,
  reasons: DefectReason[],
  certification: CertificationAction | undefined,
): SummaryDefect {
  const blocksDriving = item.safety || reasons.includes('out_of_limit');
  const defect: SummaryDefect = {
    ...foundDefect(item, result, reasons),
    blocksDriving,
    cleared: clears(blocksDriving, certification),
  };
  if (certification !== undefined) defect.certification = certification;
  if (result.fixed !== undefined) defect.failedFix = result.fixed;
  return defect;
}

function toSpotFixed(item: ChecklistItem, result: ItemResult, reasons: DefectReason[], fix: SpotFix): SpotFixedDefect {
  const fixed: SpotFixedDefect = { ...foundDefect(item, result, reasons), action: fix.action, fixedAt: fix.at };
  if (fix.measurement !== undefined) fixed.newMeasurement = fix.measurement;
  if (fix.verdict !== undefined) fixed.newVerdict = fix.verdict;
  if (fix.heard !== undefined) fixed.heard = fix.heard;
  return fixed;
}

// A measured check passed with no number; an older result without a reason was checked by eye.
function withoutReading(item: ChecklistItem, result: ItemResult): PassedWithoutReading | null {
  if (item.expects.type !== 'measure' || result.answer !== 'pass' || result.measurement !== undefined) return null;
  return { ...itemRef(item), reason: result.noReading ?? 'visual' };
}

// Verdicts are taken as given: the server re-evaluates every measurement before it stores one.
export function summarizeInspection(
  checklist: Checklist,
  results: readonly ItemResult[],
  options: SummaryOptions = {},
): InspectionSummary {
  const rule: RushedRule = { ...RUSHED_RULE, ...options.rushedRule };
  const itemsByKey = new Map(checklist.items.map((item) => [item.key, item]));
  const latest = latestResults(results);
  const certifications = certificationsByItem(options.certifications ?? []);

  const unknownItemKeys = [...latest.keys()].filter((key) => !itemsByKey.has(key)).sort();
  const defects: SummaryDefect[] = [];
  const fixedOnTheSpot: SpotFixedDefect[] = [];
  const passedWithoutReading: PassedWithoutReading[] = [];
  const unanswered: UnansweredItem[] = [];
  const timed: TimedResult[] = [];
  for (const item of checklist.items) {
    const result = latest.get(item.key);
    if (!result) {
      unanswered.push(itemRef(item));
      continue;
    }
    const reasons = defectReasons(result);
    if (reasons.length > 0) {
      if (result.fixed !== undefined && fixCounts(result, result.fixed)) {
        fixedOnTheSpot.push(toSpotFixed(item, result, reasons, result.fixed));
      } else {
        defects.push(toDefect(item, result, reasons, certifications.get(item.key)));
      }
    }
    const passed = withoutReading(item, result);
    if (passed) passedWithoutReading.push(passed);
    const atMs = parseTime(result.answeredAt);
    if (atMs !== null) timed.push({ result, item, atMs });
  }
  // Stable sort keeps checklist order for answers given at the same moment.
  timed.sort((a, b) => a.atMs - b.atMs);

  const startMs = options.startedAt !== undefined ? parseTime(options.startedAt) : null;
  const { gapsMs, byZone } = attributeGaps(timed, startMs);
  const firstMs = timed[0]?.atMs ?? null;
  const lastMs = timed[timed.length - 1]?.atMs ?? null;
  const fromMs = startMs ?? firstMs;
  const totalDurationMs = fromMs !== null && lastMs !== null ? Math.max(0, lastMs - fromMs) : null;

  const zones: ZoneTiming[] = checklist.zones.map((zone) => {
    const zoneTimed = timed.filter((entry) => entry.item.zone === zone.key);
    const timing: ZoneTiming = {
      zone: zone.key,
      title: zone.title,
      itemCount: checklist.items.filter((item) => item.zone === zone.key).length,
      answeredCount: checklist.items.filter((item) => item.zone === zone.key && latest.has(item.key)).length,
      durationMs: byZone.get(zone.key) ?? 0,
    };
    const first = zoneTimed[0];
    const last = zoneTimed[zoneTimed.length - 1];
    if (first) timing.firstAnsweredAt = first.result.answeredAt;
    if (last) timing.lastAnsweredAt = last.result.answeredAt;
    return timing;
  });

  const drivingBlockedBy = defects
    .filter((defect) => defect.blocksDriving && !defect.cleared)
    .map((defect) => defect.itemKey);
  const answeredCount = checklist.items.length - unanswered.length;
  const summary: InspectionSummary = {
    itemCount: checklist.items.length,
    answeredCount,
    defects,
    fixedOnTheSpot,
    checkedWithoutReading: passedWithoutReading.filter((entry) => entry.reason === 'visual'),
    noGauge: passedWithoutReading.filter((entry) => entry.reason === 'no_gauge'),
    safetyDefectCount: defects.filter((defect) => defect.safety).length,
    mayBeDriven: drivingBlockedBy.length === 0,
    drivingBlockedBy,
    unanswered,
    unansweredSafetyCount: unanswered.filter((item) => item.safety).length,
    zones,
    totalDurationMs,
    // Only answers with a readable time can be timed; a stop counts once however many answers it took.
    rushed: checkRushed(gapsMs, totalDurationMs, new Set(timed.map((entry) => entry.item.stopKey)).size, rule),
    unknownItemKeys,
  };
  if (options.startedAt !== undefined) summary.startedAt = options.startedAt;
  else if (timed[0]) summary.startedAt = timed[0].result.answeredAt;
  const lastTimed = timed[timed.length - 1];
  if (lastTimed) summary.finishedAt = lastTimed.result.answeredAt;
  return summary;
}
