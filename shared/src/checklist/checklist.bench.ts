// Benchmark of buildChecklist for a 5-axle tractor-trailer; the lead's bench runner calls runChecklistBench.
import { measure, type BenchResult } from '../bench/index.js';
import { buildChecklist } from './build-checklist.js';
import { sampleCombination } from './fixtures.js';
import type { Locale } from './types.js';

export type { BenchResult } from '../bench/index.js';

const WARM_UP_RUNS = 200;
const MEASURED_RUNS = 2000;
const GOAL_MS = 5;

function measureLocale(locale: Locale): BenchResult {
  const vehicles = sampleCombination();
  return measure(
    `buildChecklist pre_trip, 3-axle tractor + 2-axle trailer (${locale})`,
    GOAL_MS,
    MEASURED_RUNS,
    () => buildChecklist(vehicles, 'pre_trip', locale),
    { warmUpRuns: WARM_UP_RUNS },
  );
}

export function runChecklistBench(): BenchResult[] {
  return [measureLocale('en'), measureLocale('es')];
}
