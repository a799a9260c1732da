// Benchmark: a 15-minute narration of about 300 segments scored against the generated
// tractor-and-trailer checklist. Goal: well under 100 ms a scoring (our own target).
import { measure, type BenchResult } from '../bench/index.js';
import { buildChecklist, type Checklist } from '../checklist/index.js';
import { sampleCombination } from '../testing.js';
import { scoreNarration } from './score-narration.js';
import type { NarrationSegment } from './types.js';

export type { BenchResult } from '../bench/index.js';

const FILLER = ['okay moving on', 'um let me see', 'alright next', 'so now i am walking back'];

// One segment per checklist item, said as a student would (where, what, one point), with filler
// between, spread over 15 minutes.
export function benchNarration(checklist: Checklist, segmentCount = 300): NarrationSegment[] {
  const lines: string[] = [];
  checklist.items.forEach((item, index) => {
    const where = item.positionLabel.toLowerCase().replace(/,/g, '');
    lines.push(`${where} ${item.title.toLowerCase()} ${item.points[0]?.toLowerCase() ?? ''}`.trim());
    if (index % 20 === 19) lines.push(FILLER[index % FILLER.length]!);
  });
  while (lines.length < segmentCount) lines.push(FILLER[lines.length % FILLER.length]!);
  const spanMs = (15 * 60 * 1000) / lines.length;
  return lines.slice(0, segmentCount).map((text, index) => ({
    text: text.replace(/[^\p{L}\p{N} ]+/gu, ' '),
    startMs: Math.round(index * spanMs),
    endMs: Math.round(index * spanMs + spanMs * 0.8),
  }));
}

const WARM_UP_RUNS = 3;
const GOAL_MS = 100;

export function runNarrationBench(iterations = 40): BenchResult[] {
  const checklist = buildChecklist(sampleCombination(), 'practice', 'en');
  const segments = benchNarration(checklist);
  // A fresh copy each run, made before timing, so the per-checklist preparation is measured too.
  const fresh = Array.from({ length: WARM_UP_RUNS + iterations }, () => structuredClone(checklist));
  return [
    measure(
      `narration scoring: ${segments.length} segments x ${checklist.items.length} items`,
      GOAL_MS,
      iterations,
      (run) => scoreNarration(segments, fresh[run]!),
      { warmUpRuns: WARM_UP_RUNS },
    ),
  ];
}
