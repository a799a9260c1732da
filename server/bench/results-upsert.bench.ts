// Times PUT /api/inspections/:id/results with 150 answers a call against the built server on DATABASE_URL
// (migrated and seeded here first; both are idempotent), and GET /api/health in the same run.
// Run: npm run build -w shared && npm run build -w server && DATABASE_URL=... npx tsx server/bench/results-upsert.bench.ts
import type { ChecklistItem, InspectionResponse, LoginResponse, ResultUpsert, VehicleResponse } from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import { healthPerSecond, printFigures, runScript, startServer, routeFigure, type BenchFigure } from './bench-server';

const CALLS = 200;
const WARMUP = 20;
const ITEMS_PER_CALL = 150;
const GOAL_P95_MS = 100;

// Plausible readings: inside the limits, so the benchmark measures storing, not error paths.
const READINGS: Record<string, { value: number; unit: string }> = {
  tread_depth: { value: 8, unit: 'in/32' },
  tire_pressure: { value: 105, unit: 'psi' },
  lining_thickness: { value: 0.5, unit: 'in' },
  pushrod_stroke: { value: 1.25, unit: 'in' },
  slack_angle: { value: 90, unit: 'deg' },
  steering_lash: { value: 1, unit: 'in' },
  air_pressure: { value: 120, unit: 'psi' },
  leak_rate: { value: 1, unit: 'psi/min' },
};

async function json<T>(response: Response): Promise<T> {
  if (!response.ok) throw new Error(`${response.url} answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as T;
}

function batch(items: readonly ChecklistItem[], at: number): ResultUpsert[] {
  return items.map((item, index) => {
    const result: ResultUpsert = {
      itemKey: item.key,
      answer: 'pass',
      answeredAt: new Date(at + index * 4000).toISOString(),
      clientId: randomUUID(),
      heard: 'good',
      confidence: 0.92,
    };
    if (item.expects.type === 'measure') {
      const reading = READINGS[item.expects.quantity] ?? { value: 1, unit: 'in' };
      result.measurement = { quantity: item.expects.quantity, ...reading };
      if (item.limitContext?.specPsi) result.measurement.value = item.limitContext.specPsi;
    }
    return result;
  });
}

export async function runResultsUpsertBench(databaseUrl = process.env.DATABASE_URL): Promise<BenchFigure[]> {
  if (!databaseUrl)
    throw new Error('DATABASE_URL is required, e.g. postgres://postgres@127.0.0.1:54400/yardcall_bench.');
  runScript('migrate.js', databaseUrl);
  runScript('seed.js', databaseUrl);
  const { url, child } = await startServer(databaseUrl);
  try {
    const { accessToken } = await json<LoginResponse>(
      await fetch(`${url}/api/auth/login`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: 'driver@yardcall.test', password: 'yardcall-demo' }),
      }),
    );
    const auth = { authorization: `Bearer ${accessToken}`, 'content-type': 'application/json' };
    const vehicles = await json<VehicleResponse[]>(await fetch(`${url}/api/vehicles`, { headers: auth }));
    const power = vehicles.find((v) => v.unitNumber === 'KV-101');
    const van = vehicles.find((v) => v.unitNumber === 'KV-T21');
    if (!power || !van) throw new Error('The seeded units KV-101 and KV-T21 are missing.');
    const startedAt = Date.now() - 3_600_000;
    // A practice walk-around has every item of a pre-trip and no acknowledgement gate.
    const startInspection = async (): Promise<InspectionResponse> =>
      json<InspectionResponse>(
        await fetch(`${url}/api/inspections`, {
          method: 'POST',
          headers: auth,
          body: JSON.stringify({
            vehicleIds: [power.id, van.id],
            kind: 'practice',
            startedAt: new Date(startedAt).toISOString(),
            clientId: randomUUID(),
          }),
        }),
      );
    const put = async (inspection: InspectionResponse, call: number): Promise<number> => {
      const items = inspection.checklist.items.slice(0, ITEMS_PER_CALL);
      if (items.length < ITEMS_PER_CALL) throw new Error(`The checklist has only ${items.length} items.`);
      const body = JSON.stringify({ results: batch(items, startedAt + call * 1000) });
      const began = performance.now();
      const response = await fetch(`${url}/api/inspections/${inspection.id}/results`, {
        method: 'PUT',
        headers: auth,
        body,
      });
      await response.arrayBuffer();
      const elapsed = performance.now() - began;
      if (!response.ok) throw new Error(`PUT results answered ${response.status}.`);
      return elapsed;
    };

    // As the brief of the route says: one inspection, every call answers its 150 items again, later,
    // so all 150 rows are updated each time (the costly path: every row rewritten, every index touched).
    const inspection = await startInspection();
    for (let call = 0; call < WARMUP; call += 1) await put(inspection, call);
    const again: number[] = [];
    for (let call = WARMUP; call < WARMUP + CALLS; call += 1) again.push(await put(inspection, call));

    // As a walk-around syncs: 150 first answers of an inspection each call (inserts). Started outside the timing.
    const fresh: InspectionResponse[] = [];
    for (let n = 0; n < CALLS; n += 1) fresh.push(await startInspection());
    const first: number[] = [];
    for (const [n, each] of fresh.entries()) first.push(await put(each, n));

    const floor = await healthPerSecond(url);
    const figure = (name: string, timings: readonly number[]) => routeFigure(name, timings, GOAL_P95_MS, floor);
    return [
      figure(`PUT /api/inspections/:id/results, ${ITEMS_PER_CALL} items answered again`, again),
      figure(`PUT /api/inspections/:id/results, ${ITEMS_PER_CALL} first answers`, first),
    ];
  } finally {
    child.kill('SIGTERM');
  }
}

if (require.main === module) printFigures(runResultsUpsertBench);
