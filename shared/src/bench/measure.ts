// The figures every benchmark reports (shared's, the server's, the browser's), and timing: run a
// function many times and report its percentiles in milliseconds. `performance` is the platform's own.

export interface BenchFigure {
  name: string;
  unit: string;
  p50: number;
  p95: number;
  p99: number;
  goal: number;
  // The percentile the goal is judged at; p95 when not said.
  judgedAt?: 'p50' | 'p95' | 'p99';
  // A server figure's throughput as a share of /api/health's on the same machine.
  ratioToHealth?: number;
}

export interface BenchResult extends BenchFigure {
  unit: 'ms';
  judgedAt: 'p50' | 'p95' | 'p99';
}

// A figure measured once (a size, a modelled time): the same value at every percentile.
export function singleFigure(name: string, unit: string, value: number, goal: number): BenchFigure {
  return { name, unit, p50: value, p95: value, p99: value, goal };
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

function round2(value: number): number {
  return Math.round(value * 100) / 100;
}

// The three percentiles of ascending timings, each rounded by `round`.
function percentiles(
  sorted: readonly number[],
  round: (value: number) => number,
): Pick<BenchFigure, 'p50' | 'p95' | 'p99'> {
  return { p50: round(percentile(sorted, 50)), p95: round(percentile(sorted, 95)), p99: round(percentile(sorted, 99)) };
}

// Timings taken elsewhere (a browser, a server round trip), in any order, as one figure judged at p95.
export function timingFigure(name: string, timings: readonly number[], goal: number): BenchFigure {
  const sorted = [...timings].sort((a, b) => a - b);
  return { name, unit: 'ms', ...percentiles(sorted, round2), goal };
}

// Calls a second of timings taken one after another.
export function callsPerSecond(timings: readonly number[]): number {
  return timings.length / (timings.reduce((sum, ms) => sum + ms, 0) / 1000);
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
  return { name, unit: 'ms', ...percentiles(timings, round3), goal, judgedAt: options.judgedAt ?? 'p95' };
}
