// Times interpretUtterance per utterance over the whole corpus, repeated; the goal is p99 <= 1 ms.
import { performance } from 'node:perf_hooks';
import { LOCALES } from '../checklist/index.js';
import { CORPUS } from './corpus/corpus.js';
import { interpretUtterance } from './interpret-utterance.js';

export interface BenchResult {
  name: string;
  unit: 'ms';
  p50: number;
  p95: number;
  p99: number;
  goal: number;
}

const ROUNDS = 20;
const WARM_UP_ROUNDS = 3;
const GOAL_P99_MS = 1;

function percentile(sorted: readonly number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[index] ?? Number.NaN;
}

function round3(value: number): number {
  return Math.round(value * 1000) / 1000;
}

export function runInterpreterBench(): BenchResult[] {
  const entries = LOCALES.flatMap((locale) => CORPUS[locale].map((entry) => ({ locale, entry })));
  for (let round = 0; round < WARM_UP_ROUNDS; round += 1) {
    for (const { locale, entry } of entries) interpretUtterance(entry.alternatives, entry.expect, locale);
  }
  const timings: number[] = [];
  for (let round = 0; round < ROUNDS; round += 1) {
    for (const { locale, entry } of entries) {
      const start = performance.now();
      interpretUtterance(entry.alternatives, entry.expect, locale);
      timings.push(performance.now() - start);
    }
  }
  timings.sort((a, b) => a - b);
  return [
    {
      name: `interpretUtterance per utterance (${entries.length} corpus utterances x ${ROUNDS})`,
      unit: 'ms',
      p50: round3(percentile(timings, 50)),
      p95: round3(percentile(timings, 95)),
      p99: round3(percentile(timings, 99)),
      goal: GOAL_P99_MS,
    },
  ];
}
