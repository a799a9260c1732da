// Benchmark of buildChecklist for a 5-axle tractor-trailer; the lead's bench runner calls runChecklistBench.
import { buildChecklist } from './build-checklist.js';
import { sampleCombination } from './fixtures.js';
import type { Locale } from './types.js';

export interface BenchResult {
  name: string;
  unit: 'ms';
  p50: number;
  p95: number;
  p99: number;
  goal: number;
}

const WARM_UP_RUNS = 200;
const MEASURED_RUNS = 2000;
const GOAL_MS = 5;

function percentile(sorted: readonly number[], fraction: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1);
  return Math.round((sorted[Math.max(0, index)] ?? 0) * 1000) / 1000;
}

function measure(locale: Locale): BenchResult {
  const vehicles = sampleCombination();
  for (let i = 0; i < WARM_UP_RUNS; i += 1) buildChecklist(vehicles, 'pre_trip', locale);
  const times: number[] = [];
  for (let i = 0; i < MEASURED_RUNS; i += 1) {
    const start = performance.now();
    buildChecklist(vehicles, 'pre_trip', locale);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return {
    name: `buildChecklist pre_trip, 3-axle tractor + 2-axle trailer (${locale})`,
    unit: 'ms',
    p50: percentile(times, 0.5),
    p95: percentile(times, 0.95),
    p99: percentile(times, 0.99),
    goal: GOAL_MS,
  };
}

export function runChecklistBench(): BenchResult[] {
  return [measure('en'), measure('es')];
}
