import type {
  ChecklistItem,
  InspectionResponse,
  ResultUpsert,
  RetentionPurgeResult,
  RetentionSettings,
} from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { bearer, bodyOf, errorBody, newTractor, putAnswers, signAndSubmit, startInspection, suiteApp } from './helpers';
import { JOB_RETENTION_PURGE } from '../src/jobs/job-names';
import { JobsService } from '../src/jobs/jobs.service';
import { makeWav } from './media-fixtures';

// Two years back: older than any retention setting this suite uses.
const AGE = "interval '2 years'";

describe('record retention', () => {
  const { t, tokens } = suiteApp(() => setMonths(3));

  const settings = async () =>
    bodyOf<RetentionSettings>(await request(t.url).get('/api/organizations/retention').set(bearer(tokens.admin)));
  const setMonths = (months: unknown) =>
    request(t.url).patch('/api/organizations/retention').set(bearer(tokens.admin)).send({ months });

  it('keeps three months by default and refuses less, naming the rule', async () => {
    const current = await settings();
    expect(current).toMatchObject({ months: 3, minimumMonths: 3 });
    const cutoff = new Date(current.cutoff);
    const expected = new Date();
    expected.setUTCMonth(expected.getUTCMonth() - 3);
    expect(Math.abs(cutoff.getTime() - expected.getTime())).toBeLessThan(4 * 86_400_000);

    const tooShort = await setMonths(2);
    expect(tooShort.status).toBe(400);
    expect(errorBody(tooShort).fields).toEqual([
      { field: 'months', message: expect.stringContaining('49 CFR 396.11(a)(4)') as string },
    ]);
    expect(errorBody(tooShort).message).toMatch(/at least 3 months/);
    expect((await setMonths(2.5)).status).toBe(400);
    expect((await setMonths('six')).status).toBe(400);
    expect((await settings()).months).toBe(3);

    const longer = await setMonths(18);
    expect(longer.status).toBe(200);
    expect(bodyOf<RetentionSettings>(longer).months).toBe(18);
    const [row] = await t.dataSource.query<{ retention_months: number }[]>(
      `SELECT o.retention_months FROM organizations o JOIN users u ON u.organization_id = o.id WHERE u.email = $1`,
      ['admin@yardcall.test'],
    );
    expect(row!.retention_months).toBe(18);
    expect((await setMonths(3)).status).toBe(200);
  });

  it('refuses everyone but the admin', async () => {
    for (const role of ['driver', 'mechanic', 'supervisor', 'trainer'] as const) {
      expect((await request(t.url).get('/api/organizations/retention').set(bearer(tokens[role]))).status).toBe(403);
      expect((await request(t.url).post('/api/organizations/retention/purge').set(bearer(tokens[role]))).status).toBe(
        403,
      );
    }
  });

  // A submitted walk-around with the given defects (answered as defects) and a voice note on the first item.
  async function report(pick: (items: ChecklistItem[]) => ChecklistItem[]): Promise<InspectionResponse> {
    const vehicle = await newTractor(t.url, tokens.admin, 'RT');
    const started = await startInspection(t.url, tokens.driver, { vehicleIds: [vehicle.id] });
    const bad = new Set(pick(started.checklist.items).map((i) => i.key));
    const results: ResultUpsert[] = started.checklist.items.slice(0, 20).map((item) => ({
      itemKey: item.key,
      answer: bad.has(item.key) ? 'defect' : 'pass',
      answeredAt: new Date().toISOString(),
      clientId: randomUUID(),
    }));
    for (const key of bad) {
      if (!results.some((r) => r.itemKey === key)) {
        results.push({ itemKey: key, answer: 'defect', answeredAt: new Date().toISOString(), clientId: randomUUID() });
      }
    }
    await putAnswers(t.url, tokens.driver, started.id, results);
    const note = await request(t.url)
      .post(`/api/inspections/${started.id}/notes`)
      .set(bearer(tokens.driver))
      .field('itemKey', started.checklist.items[0]!.key)
      .field('clientId', randomUUID())
      .field('durationMs', '250')
      .attach('file', makeWav(250), { filename: 'note.wav', contentType: 'audio/wav' });
    expect(note.status).toBe(201);
    return signAndSubmit(t.url, tokens.driver, started.id);
  }

  const minor = (items: ChecklistItem[]) => [items.find((i) => !i.safety && i.expects.type === 'check')!];

  async function repair(defectId: string) {
    const response = await request(t.url)
      .post(`/api/defects/${defectId}/repair`)
      .set(bearer(tokens.mechanic))
      .send({ action: 'repaired', note: 'Replaced.', signature: { name: 'Rui Almeida' } });
    expect(response.status).toBe(201);
  }

  // Every record of the inspection moved two years back.
  async function age(inspectionId: string, except: 'signatures' | null = null) {
    const q = (sql: string) => t.dataSource.query(sql, [inspectionId]);
    await q(
      `UPDATE inspections SET started_at = started_at - ${AGE}, submitted_at = submitted_at - ${AGE}, updated_at = updated_at - ${AGE}, created_at = created_at - ${AGE} WHERE id = $1`,
    );
    await q(`UPDATE item_results SET answered_at = answered_at - ${AGE} WHERE inspection_id = $1`);
    await q(
      `UPDATE defects SET created_at = created_at - ${AGE}, updated_at = updated_at - ${AGE} WHERE inspection_id = $1`,
    );
    await q(
      `UPDATE repairs SET signed_at = signed_at - ${AGE} WHERE defect_id IN (SELECT id FROM defects WHERE inspection_id = $1)`,
    );
    if (except !== 'signatures')
      await q(`UPDATE signatures SET signed_at = signed_at - ${AGE} WHERE inspection_id = $1`);
    await q(`UPDATE voice_notes SET created_at = created_at - ${AGE} WHERE inspection_id = $1`);
    await q(`UPDATE photos SET created_at = created_at - ${AGE} WHERE inspection_id = $1`);
  }

  async function rowsOf(inspectionId: string): Promise<Record<string, number>> {
    const [row] = await t.dataSource.query<Record<string, number>[]>(
      `SELECT (SELECT count(*) FROM inspections WHERE id = $1)::int AS inspections,
              (SELECT count(*) FROM item_results WHERE inspection_id = $1)::int AS "itemResults",
              (SELECT count(*) FROM voice_notes WHERE inspection_id = $1)::int AS "voiceNotes",
              (SELECT count(*) FROM defects WHERE inspection_id = $1)::int AS defects,
              (SELECT count(*) FROM repairs p JOIN defects d ON d.id = p.defect_id WHERE d.inspection_id = $1)::int AS repairs,
              (SELECT count(*) FROM signatures WHERE inspection_id = $1)::int AS signatures,
              (SELECT count(*) FROM inspection_vehicles WHERE inspection_id = $1)::int AS "inspectionVehicles"`,
      [inspectionId],
    );
    return row!;
  }

  it('purges only what is older than the cutoff: never a younger record, nor one with an open defect', async () => {
    const old = await report(minor);
    await repair(old.defects[0]!.id);
    await age(old.id);
    const oldOpen = await report(minor);
    await age(oldOpen.id);
    const young = await report(minor);
    await repair(young.defects[0]!.id);
    // Old, but a signature of it is recent (e.g. the next driver's review): kept whole.
    const recentlySigned = await report(() => []);
    await age(recentlySigned.id, 'signatures');

    const before = await rowsOf(old.id);
    expect(before).toMatchObject({ inspections: 1, voiceNotes: 1, defects: 1, repairs: 1, inspectionVehicles: 1 });
    expect(before.signatures).toBeGreaterThanOrEqual(2);
    const [note] = await t.dataSource.query<{ object_key: string }[]>(
      'SELECT object_key FROM voice_notes WHERE inspection_id = $1',
      [old.id],
    );
    // The local store keeps files under data/ in STORAGE_DIR (a throw-away folder in tests).
    const file = join(process.env.STORAGE_DIR!, 'data', note!.object_key);
    expect(existsSync(file)).toBe(true);

    const response = await request(t.url).post('/api/organizations/retention/purge').set(bearer(tokens.admin));
    expect(response.status).toBe(200);
    const result = bodyOf<RetentionPurgeResult>(response);
    expect(Date.parse(result.cutoff)).toBeLessThan(Date.now() - 80 * 86_400_000);
    expect(result.removed.inspections).toBeGreaterThanOrEqual(1);
    expect(result.removed.itemResults).toBeGreaterThanOrEqual(before.itemResults!);
    expect(result.removed.voiceNotes).toBeGreaterThanOrEqual(1);
    expect(result.removed.defects).toBeGreaterThanOrEqual(1);
    expect(result.removed.repairs).toBeGreaterThanOrEqual(1);
    expect(result.removed.signatures).toBeGreaterThanOrEqual(before.signatures!);
    expect(result.removed.storedObjects).toBeGreaterThanOrEqual(1);
    expect(result.keptWithOpenDefects).toBeGreaterThanOrEqual(1);

    expect(await rowsOf(old.id)).toEqual({
      inspections: 0,
      itemResults: 0,
      voiceNotes: 0,
      defects: 0,
      repairs: 0,
      signatures: 0,
      inspectionVehicles: 0,
    });
    expect(existsSync(file)).toBe(false);
    for (const kept of [oldOpen, young, recentlySigned]) {
      const rows = await rowsOf(kept.id);
      expect(rows.inspections).toBe(1);
      expect(rows.voiceNotes).toBe(1);
      expect((await request(t.url).get(`/api/inspections/${kept.id}`).set(bearer(tokens.supervisor))).status).toBe(200);
    }
    expect((await request(t.url).get(`/api/inspections/${old.id}`).set(bearer(tokens.supervisor))).status).toBe(404);

    // A second purge finds nothing more of these.
    const again = bodyOf<RetentionPurgeResult>(
      await request(t.url).post('/api/organizations/retention/purge').set(bearer(tokens.admin)),
    );
    expect(again.removed.inspections).toBe(0);
  });

  it('keeps an old report while the setting is longer than its age', async () => {
    const old = await report(() => []);
    // One year back: inside an 18-month setting, outside the 3-month default.
    await t.dataSource.query(
      `UPDATE inspections SET started_at = started_at - interval '1 year', submitted_at = submitted_at - interval '1 year', updated_at = updated_at - interval '1 year' WHERE id = $1`,
      [old.id],
    );
    await t.dataSource.query(
      `UPDATE item_results SET answered_at = answered_at - interval '1 year' WHERE inspection_id = $1`,
      [old.id],
    );
    await t.dataSource.query(
      `UPDATE signatures SET signed_at = signed_at - interval '1 year' WHERE inspection_id = $1`,
      [old.id],
    );
    await t.dataSource.query(
      `UPDATE voice_notes SET created_at = created_at - interval '1 year' WHERE inspection_id = $1`,
      [old.id],
    );
    expect((await setMonths(18)).status).toBe(200);
    await request(t.url).post('/api/organizations/retention/purge').set(bearer(tokens.admin));
    expect((await rowsOf(old.id)).inspections).toBe(1);
    expect((await setMonths(3)).status).toBe(200);
    await request(t.url).post('/api/organizations/retention/purge').set(bearer(tokens.admin));
    expect((await rowsOf(old.id)).inspections).toBe(0);
  });

  it('runs the purge as a job on the queue', async () => {
    const old = await report(() => []);
    await age(old.id);
    const id = await t.app.get(JobsService).send(JOB_RETENTION_PURGE, {});
    expect(id).toEqual(expect.any(String));
    const until = Date.now() + 15_000;
    let state: string | undefined;
    while (Date.now() < until) {
      state = (await t.app.get(JobsService).stateOf(JOB_RETENTION_PURGE, id!))?.state;
      if (state === 'completed' || state === 'failed') break;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    expect(state).toBe('completed');
    expect((await rowsOf(old.id)).inspections).toBe(0);
  });

  it('schedules the purge daily on the job queue', async () => {
    const rows = await t.dataSource.query<{ name: string; cron: string }[]>(
      "SELECT name, cron FROM pgboss.schedule WHERE name = 'retention-purge'",
    );
    expect(rows).toEqual([{ name: 'retention-purge', cron: '17 3 * * *' }]);
  });
});
