import './env';
import { buildChecklist, RUSHED_RULE, summarizeInspection, type InspectionKind } from '@yardcall/shared';
import { DataSource } from 'typeorm';
import { buildDataSourceOptions } from '../src/database/data-source';
import { SEED_ORGANIZATIONS } from '../src/database/seed-data';
import { HISTORY_CLIENT_PREFIX } from '../src/database/seed-history';
import type { Inspection } from '../src/inspections/entities/inspection.entity';

interface InspectionRow {
  id: string;
  kind: InspectionKind;
  started_at: Date;
  vehicles: Inspection['vehicles'];
  rushed: boolean;
  recurring_defect: boolean;
  defect_count: number;
}

interface ResultRow {
  inspection_id: string;
  item_key: string;
  stop_time: Date;
  answer: 'pass' | 'defect' | 'not_applicable';
  verdict: 'ok' | 'near_limit' | 'out_of_limit' | null;
  no_reading: 'visual' | 'no_gauge' | null;
  fixed: unknown;
}

// The demo history (global set-up seeded it) holds only what the product's own rules would store.
describe('demo history', () => {
  let dataSource: DataSource;
  let inspections: InspectionRow[];
  let organizationId: string;

  beforeAll(async () => {
    dataSource = await new DataSource({
      ...buildDataSourceOptions(process.env.DATABASE_URL ?? ''),
      logging: false,
    }).initialize();
    const [org] = await dataSource.query<{ id: string }[]>(
      "SELECT id FROM organizations WHERE name = 'Kestrel Valley Freight'",
    );
    organizationId = org!.id;
    inspections = await dataSource.query<InspectionRow[]>(
      `SELECT id, kind, started_at, vehicles, rushed, recurring_defect, defect_count FROM inspections
        WHERE organization_id = $1 AND client_id LIKE $2 ORDER BY started_at`,
      [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
    );
  });
  afterAll(async () => {
    await dataSource.destroy();
  });

  it('spans about eight weeks, only in the demo organisation', async () => {
    expect(inspections.length).toBeGreaterThan(100);
    const spanDays = (Date.now() - inspections[0]!.started_at.getTime()) / 86_400_000;
    expect(spanDays).toBeGreaterThan(50);
    expect(spanDays).toBeLessThan(60);
    const [other] = await dataSource.query<{ n: number }[]>(
      'SELECT count(*)::int AS n FROM inspections WHERE organization_id <> $1 AND client_id LIKE $2',
      [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
    );
    expect(other!.n).toBe(0);
  });

  it("answers every item of each report's checklist once, a stop's items at one time, at a pace only one report rushes", async () => {
    const rows = await dataSource.query<ResultRow[]>(
      `SELECT r.inspection_id, r.item_key, r.answered_at AS stop_time, r.answer, r.verdict, r.no_reading, r.fixed
         FROM item_results r JOIN inspections i ON i.id = r.inspection_id
        WHERE i.organization_id = $1 AND i.client_id LIKE $2`,
      [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
    );
    const byInspection = new Map<string, ResultRow[]>();
    for (const row of rows) byInspection.set(row.inspection_id, [...(byInspection.get(row.inspection_id) ?? []), row]);
    let rushed = 0;
    for (const inspection of inspections) {
      const checklist = buildChecklist(inspection.vehicles, inspection.kind, 'en');
      const results = byInspection.get(inspection.id) ?? [];
      expect(results.map((r) => r.item_key).sort()).toEqual(checklist.items.map((i) => i.key).sort());
      const timeOf = new Map(results.map((r) => [r.item_key, r.stop_time.getTime()]));
      for (const stop of checklist.stops) {
        expect(new Set(stop.itemKeys.map((key) => timeOf.get(key))).size).toBe(1);
      }
      const summary = summarizeInspection(
        checklist,
        results.map((r) => ({
          itemKey: r.item_key,
          answer: r.answer,
          answeredAt: r.stop_time.toISOString(),
          ...(r.verdict ? { verdict: r.verdict } : {}),
          ...(r.fixed ? { fixed: r.fixed as never } : {}),
        })),
        { startedAt: inspection.started_at.toISOString() },
      );
      expect(inspection.rushed).toBe(summary.rushed.rushed);
      expect(inspection.defect_count).toBe(summary.defects.length);
      if (summary.rushed.rushed) rushed += 1;
      // A measured check passed without a value is recorded as checked by eye (no reading is required).
      for (const r of results.filter((x) => x.answer === 'pass' && x.verdict === null)) {
        const item = checklist.items.find((i) => i.key === r.item_key)!;
        expect(r.no_reading).toBe(item.expects.type === 'measure' ? 'visual' : null);
      }
    }
    // RUSHED_RULE: 7.5 s a stop at least; one walk-around of the history breaks it on purpose.
    expect(RUSHED_RULE.minMsPerStop).toBe(7500);
    expect(rushed).toBe(1);
  });

  it('tells the demo stories: one unit out of service, a deferral, a recurrence, a fix on the spot and waiting reviews', async () => {
    const seeded = SEED_ORGANIZATIONS[0]!.vehicles.map((v) => v.unitNumber);
    const vehicles = await dataSource.query<{ unit_number: string; status: string; status_reason: string | null }[]>(
      `SELECT unit_number, status, status_reason FROM vehicles
        WHERE organization_id = $1 AND unit_number = ANY($2) AND status = 'out_of_service'`,
      [organizationId, seeded],
    );
    expect(vehicles.map((v) => v.unit_number)).toEqual(['KV-T22']);
    expect(vehicles[0]!.status_reason).toMatch(/Trailer air lines/);
    const defects = await dataSource.query<{ status: string; safety: boolean }[]>(
      `SELECT d.status, d.safety FROM defects d JOIN inspections i ON i.id = d.inspection_id
        WHERE d.organization_id = $1 AND i.client_id LIKE $2`,
      [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
    );
    expect(defects.filter((d) => d.status === 'open')).toEqual([{ status: 'open', safety: true }]);
    expect(defects.filter((d) => d.status === 'deferred')).toEqual([{ status: 'deferred', safety: false }]);
    expect(defects.filter((d) => d.status === 'repaired').length).toBeGreaterThanOrEqual(3);
    expect(inspections.filter((i) => i.recurring_defect)).toHaveLength(1);
    const [fixed] = await dataSource.query<{ n: number }[]>(
      `SELECT count(*)::int AS n FROM item_results r JOIN inspections i ON i.id = r.inspection_id
        WHERE i.organization_id = $1 AND i.client_id LIKE $2 AND r.fixed IS NOT NULL`,
      [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
    );
    expect(fixed!.n).toBeGreaterThanOrEqual(1);
    const [media] = await dataSource.query<{ notes: number; photos: number; reviewed: number; waiting: number }[]>(
      `SELECT (SELECT count(*)::int FROM voice_notes WHERE organization_id = $1 AND client_id LIKE $2) AS notes,
              (SELECT count(*)::int FROM photos WHERE organization_id = $1 AND client_id LIKE $2) AS photos,
              (SELECT count(*)::int FROM training_attempts a WHERE a.client_id LIKE $2
                  AND EXISTS (SELECT 1 FROM training_reviews r WHERE r.attempt_id = a.id)) AS reviewed,
              (SELECT count(*)::int FROM training_attempts a WHERE a.client_id LIKE $2 AND a.audio_object_key IS NOT NULL
                  AND NOT EXISTS (SELECT 1 FROM training_reviews r WHERE r.attempt_id = a.id)) AS waiting`,
      [organizationId, `${HISTORY_CLIENT_PREFIX}%`],
    );
    expect(media).toEqual({ notes: 3, photos: 1, reviewed: 1, waiting: 1 });
  });
});
