// Says why a walk-around was flagged as rushed. The rule and its thresholds have one home:
// RUSHED_RULE and summarizeInspection in ../summary (our own practice, no published source).
import type { RushedCheck } from '../summary/index.js';
import type { RushedFlag } from './types.js';

function seconds(ms: number): number {
  return Math.round(ms / 100) / 10;
}

// answeredCount is the items answered, shown beside the stops the pace is judged over.
export function rushedFlag(check: RushedCheck, answeredCount: number): RushedFlag | null {
  if (!check.rushed) return null;
  const stops = check.answeredStopCount;
  return {
    reasons: [...check.reasons],
    answeredCount,
    answeredStopCount: stops,
    secondsPerStop: check.totalDurationMs !== null && stops > 0 ? seconds(check.totalDurationMs / stops) : null,
    medianGapSeconds: check.medianGapMs !== null ? seconds(check.medianGapMs) : null,
    minimumSecondsPerStop: seconds(check.rule.minMsPerStop),
    minimumMedianGapSeconds: seconds(check.rule.minMedianGapMs),
  };
}
