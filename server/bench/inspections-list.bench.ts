// Times GET /api/inspections (the supervisor's list) against the built server on DATABASE_URL with
// 100 000 inspections in one organisation: first pages, deep pages followed by cursor, and filters.
// The database is migrated and seeded here, then filled with set-based SQL (generate_series).
// Run: npm run build -w shared && npm run build -w server && DATABASE_URL=... npx tsx server/bench/inspections-list.bench.ts
import type { InspectionPage, LoginResponse } from '@yardcall/shared';
import { Client } from 'pg';
import { healthPerSecond, printFigures, runScript, startServer, routeFigure, type BenchFigure } from './bench-server';

const INSPECTIONS = 100_000;
// More units than the demo's seven: copies of the seeded configurations under their own numbers.
const EXTRA_UNITS_PER_SEEDED = 6;
const CALLS = 150;
const WARMUP = 20;
const DEEP_PAGES = 150;
const GOAL_P95_MS = 50;

// Idempotent: a database that already holds the bench's rows is left as it is.
async function fill(databaseUrl: string): Promise<{ organizationId: string; vehicleId: string; driverId: string }> {
  const db = new Client({ connectionString: databaseUrl });
  await db.connect();
  try {
    const [org] = (
      await db.query<{ id: string }>("SELECT organization_id AS id FROM users WHERE email = 'supervisor@yardcall.test'")
    ).rows;
    if (!org) throw new Error('The demo organisation is missing: was the database seeded?');
    const organizationId = org.id;
    await db.query(
      `INSERT INTO vehicles (organization_id, unit_number, kind, vin, plate, status, config)
       SELECT v.organization_id, v.unit_number || '-B' || g, v.kind, v.vin, v.plate, 'in_service', v.config
         FROM vehicles v, generate_series(1, $2::int) g
        WHERE v.organization_id = $1 AND v.unit_number NOT LIKE '%-B%'
       ON CONFLICT DO NOTHING`,
      [organizationId, EXTRA_UNITS_PER_SEEDED],
    );
    const existing = await db.query<{ n: number }>(
      "SELECT count(*)::int AS n FROM inspections WHERE organization_id = $1 AND client_id LIKE 'bench-%'",
      [organizationId],
    );
    if ((existing.rows[0]?.n ?? 0) < INSPECTIONS) {
      // Spread: one walk-around every ~5 minutes back through a year, across every unit and driver; about
      // 12 % with defects, 4 % rushed, 2 % recurring; the newest 40 still in progress.
      await db.query(
        `WITH units AS (
           SELECT row_number() OVER (ORDER BY id) AS n, id, unit_number, kind, config FROM vehicles
            WHERE organization_id = $1 AND kind <> 'trailer'),
         drivers AS (
           SELECT row_number() OVER (ORDER BY id) AS n, id FROM users WHERE organization_id = $1 AND role = 'driver'),
         counts AS (SELECT (SELECT count(*) FROM units) AS units, (SELECT count(*) FROM drivers) AS drivers),
         rows AS (
           SELECT g,
                  (SELECT id FROM drivers d WHERE d.n = 1 + (g * 7) % c.drivers) AS driver_id,
                  u.id AS vehicle_id, u.unit_number, u.kind AS vehicle_kind, u.config,
                  now() - (g * interval '5 minutes') - (random() * interval '4 minutes') AS started_at,
                  random() AS r
             FROM generate_series(1, $2::int) g
             CROSS JOIN counts c
             JOIN units u ON u.n = 1 + (g * 13) % c.units),
         ins AS (
           INSERT INTO inspections (organization_id, driver_id, kind, status, locale, client_id, started_at,
                                    submitted_at, vehicles, rushed, defect_count, recurring_defect, duration_seconds)
           SELECT $1, driver_id,
                  (CASE WHEN g % 10 < 6 THEN 'pre_trip' WHEN g % 10 < 9 THEN 'post_trip' ELSE 'en_route' END)::inspection_kind,
                  (CASE WHEN g <= 40 THEN 'in_progress' ELSE 'submitted' END)::inspection_status,
                  CASE WHEN g % 7 = 0 THEN 'es' ELSE 'en' END,
                  'bench-' || g, started_at,
                  CASE WHEN g <= 40 THEN NULL ELSE started_at + interval '15 minutes' + (r * interval '10 minutes') END,
                  jsonb_build_array(jsonb_build_object('id', vehicle_id, 'unitNumber', unit_number, 'kind', vehicle_kind, 'config', config)),
                  r < 0.04,
                  CASE WHEN r > 0.88 THEN 1 + (g % 3) ELSE 0 END,
                  r > 0.98,
                  CASE WHEN g <= 40 THEN NULL ELSE 600 + (r * 900)::int END
             FROM rows
           RETURNING id, (vehicles -> 0 ->> 'id')::uuid AS vehicle_id)
         INSERT INTO inspection_vehicles (inspection_id, position, vehicle_id) SELECT id, 0, vehicle_id FROM ins`,
        [organizationId, INSPECTIONS],
      );
      await db.query('ANALYZE inspections; ANALYZE inspection_vehicles; ANALYZE users');
    }
    const [sample] = (
      await db.query<{ vehicle_id: string; driver_id: string }>(
        `SELECT iv.vehicle_id, i.driver_id FROM inspections i JOIN inspection_vehicles iv ON iv.inspection_id = i.id
          WHERE i.organization_id = $1 AND i.client_id = 'bench-5000'`,
        [organizationId],
      )
    ).rows;
    if (!sample) throw new Error('The bench inspections are missing.');
    return { organizationId, vehicleId: sample.vehicle_id, driverId: sample.driver_id };
  } finally {
    await db.end();
  }
}

// The cursor of the row at `offset` in the default order: where a deep page starts.
async function cursorAt(databaseUrl: string, organizationId: string, offset: number): Promise<string> {
  const db = new Client({ connectionString: databaseUrl });
  await db.connect();
  try {
    const [row] = (
      await db.query<{ at: string; id: string }>(
        `SELECT to_char(started_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"') AS at, id
           FROM inspections WHERE organization_id = $1
          ORDER BY started_at DESC, id DESC OFFSET $2 LIMIT 1`,
        [organizationId, offset],
      )
    ).rows;
    if (!row) throw new Error(`No row at offset ${offset}.`);
    return Buffer.from(JSON.stringify(['startedAt', 'desc', row.at, row.id])).toString('base64url');
  } finally {
    await db.end();
  }
}

export async function runInspectionsListBench(databaseUrl = process.env.DATABASE_URL): Promise<BenchFigure[]> {
  if (!databaseUrl)
    throw new Error('DATABASE_URL is required, e.g. postgres://postgres@127.0.0.1:54400/yardcall_bench_list.');
  runScript('migrate.js', databaseUrl);
  runScript('seed.js', databaseUrl);
  const { organizationId, vehicleId, driverId } = await fill(databaseUrl);
  const deepCursor = await cursorAt(databaseUrl, organizationId, Math.floor(INSPECTIONS * 0.8));
  const { url, child } = await startServer(databaseUrl);
  try {
    const login = await fetch(`${url}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'supervisor@yardcall.test', password: 'yardcall-demo' }),
    });
    if (!login.ok) throw new Error(`login answered ${login.status}`);
    const { accessToken } = (await login.json()) as LoginResponse;
    const headers = { authorization: `Bearer ${accessToken}` };

    const get = async (query: string): Promise<{ ms: number; page: InspectionPage }> => {
      const began = performance.now();
      const response = await fetch(`${url}/api/inspections?${query}`, { headers });
      const text = await response.text();
      const ms = performance.now() - began;
      if (!response.ok) throw new Error(`GET /api/inspections?${query} answered ${response.status}: ${text}`);
      return { ms, page: JSON.parse(text) as InspectionPage };
    };
    // The first page `CALLS` times.
    const firstPages = async (query: string): Promise<number[]> => {
      const timings: number[] = [];
      for (let call = 0; call < CALLS; call += 1) timings.push((await get(query)).ms);
      return timings;
    };
    // Page after page following nextCursor, from `cursor` (or the start).
    const following = async (query: string, pages: number, cursor?: string): Promise<number[]> => {
      const timings: number[] = [];
      let next = cursor ?? null;
      for (let n = 0; n < pages; n += 1) {
        const { ms, page } = await get(`${query}${next ? `&cursor=${encodeURIComponent(next)}` : ''}`);
        timings.push(ms);
        if (!page.nextCursor) break;
        next = page.nextCursor;
      }
      return timings;
    };

    for (let call = 0; call < WARMUP; call += 1) await get('limit=25');
    const month = `from=${new Date(Date.now() - 200 * 86_400_000).toISOString().slice(0, 10)}&to=${new Date(Date.now() - 170 * 86_400_000).toISOString().slice(0, 10)}`;
    const runs: [string, number[]][] = [
      ['first page, newest first', await firstPages('limit=25')],
      ['pages 2-151 following cursors', (await following('limit=25', DEEP_PAGES + 1)).slice(1)],
      ['deep pages (from row 80 000) following cursors', await following('limit=25', DEEP_PAGES, deepCursor)],
      ['oldest first (sort=startedAt&order=asc), following cursors', await following('limit=25&order=asc', DEEP_PAGES)],
      ['sort=submittedAt, following cursors', await following('limit=25&sort=submittedAt', DEEP_PAGES)],
      [
        'filter vehicleId (one unit), following cursors',
        await following(`limit=25&vehicleId=${vehicleId}`, DEEP_PAGES),
      ],
      ['filter driverId, following cursors', await following(`limit=25&driverId=${driverId}`, DEEP_PAGES)],
      ['filter kind=en_route, following cursors', await following('limit=25&kind=en_route', DEEP_PAGES)],
      ['filter hasDefects=true, following cursors', await following('limit=25&hasDefects=true', DEEP_PAGES)],
      ['filter rushed=true, following cursors', await following('limit=25&rushed=true', DEEP_PAGES)],
      ['filter a month (from/to), following cursors', await following(`limit=25&${month}`, DEEP_PAGES)],
      [
        'filter driverId + hasDefects=true, first page',
        await firstPages(`limit=25&driverId=${driverId}&hasDefects=true`),
      ],
      ['filter status=in_progress (40 of 100 000), first page', await firstPages('limit=25&status=in_progress')],
      ['first page of 100 rows', await firstPages('limit=100')],
    ];
    const floor = await healthPerSecond(url);
    return runs.map(([what, timings]) =>
      routeFigure(`GET /api/inspections (${INSPECTIONS / 1000}k rows), ${what}`, timings, GOAL_P95_MS, floor),
    );
  } finally {
    child.kill('SIGTERM');
  }
}

if (require.main === module) printFigures(runInspectionsListBench);
