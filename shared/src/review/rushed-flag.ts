// Says why a walk-around was flagged as rushed. The rule and its thresholds have one home:
// RUSHED_RULE and summarizeInspection in ../summary (our own practice, no published source).
import type { RushedCheck } from '../summary/index.js';
import type { RushedFlag } from './types.js';

function seconds(ms: number): number {
  return Math.round(ms / 100) / 10;
}

export function rushedFlag(check: RushedCheck, answeredCount: number): RushedFlag | null {
  if (!check.rushed) return null;
  return {
    reasons: [...check.reasons],
    answeredCount,
    secondsPerItem:
      check.totalDurationMs !== null && answeredCount > 0 ? seconds(check.totalDurationMs / answeredCount) : null,
    medianGapSeconds: check.medianGapMs !== null ? seconds(check.medianGapMs) : null,
    minimumSecondsPerItem: seconds(check.rule.minMsPerItem),
    minimumMedianGapSeconds: seconds(check.rule.minMedianGapMs),
  };
}
