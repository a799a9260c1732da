// Timing for the benchmarks: run a function many times and report its percentiles in milliseconds.
import { performance } from 'node:perf_hooks';

export interface BenchResult {
  name: string;
  unit: 'ms';
  p50: number;
  p95: number;
  p99: number;
  goal: number;
  // The percentile the goal is judged at.
  judgedAt: 'p50' | 'p95' | 'p99';
}

export interface MeasureOptions {
  // Untimed runs first, so the JIT and caches settle.
  warmUpRuns?: number;
  // Default p95.
  judgedAt?: BenchResult['judgedAt'];
}

// Nearest-rank percentile of ascending timings; `p` in percent.
export function percentile(sorted: readonly number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[index] ?? Number.NaN;
}

function round3(value: number): number {
  return Math.round(value * 1000) / 1000;
}

// `fn` gets the run's number, counting warm-up runs first, so callers can cycle through inputs.
export function measure(
  name: string,
  goal: number,
  runs: number,
  fn: (run: number) => void,
  options: MeasureOptions = {},
): BenchResult {
  const warmUpRuns = options.warmUpRuns ?? 0;
  for (let run = 0; run < warmUpRuns; run += 1) fn(run);
  const timings: number[] = [];
  for (let run = warmUpRuns; run < warmUpRuns + runs; run += 1) {
    const start = performance.now();
    fn(run);
    timings.push(performance.now() - start);
  }
  timings.sort((a, b) => a - b);
  return {
    name,
    unit: 'ms',
    p50: round3(percentile(timings, 50)),
    p95: round3(percentile(timings, 95)),
    p99: round3(percentile(timings, 99)),
    goal,
    judgedAt: options.judgedAt ?? 'p95',
  };
}
