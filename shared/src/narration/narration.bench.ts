// Benchmark: a 15-minute narration of about 300 segments scored against the generated
// tractor-and-trailer checklist. Goal: well under 100 ms a scoring (our own target).
import { buildChecklist, sampleCombination, type Checklist } from '../checklist/index.js';
import { scoreNarration } from './score-narration.js';
import type { NarrationSegment } from './types.js';

export interface BenchResult {
  name: string;
  unit: 'ms';
  p50: number;
  p95: number;
  p99: number;
  goal: number;
}

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

function percentile(sorted: readonly number[], fraction: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1);
  return sorted[Math.max(0, index)]!;
}

export function runNarrationBench(iterations = 40): BenchResult[] {
  const checklist = buildChecklist(sampleCombination(), 'practice', 'en');
  const segments = benchNarration(checklist);
  const timings: number[] = [];
  for (let i = 0; i < iterations + 3; i++) {
    // A fresh copy each time, so the per-checklist preparation is measured too.
    const fresh = structuredClone(checklist);
    const started = performance.now();
    scoreNarration(segments, fresh);
    const elapsed = performance.now() - started;
    if (i >= 3) timings.push(elapsed);
  }
  timings.sort((a, b) => a - b);
  return [
    {
      name: `narration scoring: ${segments.length} segments x ${checklist.items.length} items`,
      unit: 'ms',
      p50: percentile(timings, 0.5),
      p95: percentile(timings, 0.95),
      p99: percentile(timings, 0.99),
      goal: 100,
    },
  ];
}
