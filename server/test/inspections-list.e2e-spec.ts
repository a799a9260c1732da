import type {
  ChecklistItem,
  InspectionListItem,
  InspectionPage,
  InspectionResponse,
  ResultUpsert,
  UserSummary,
} from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { bearer, bodyOf, errorBody, newTractor, SECOND_DRIVER, signIn, startInspection, suiteApp } from './helpers';

const MINUTE = 60_000;

interface Walk {
  token: string;
  kind: string;
  startedAt: number;
  gapMs?: number;
  // Answer stop by stop: the items of a stop share one time, gapMs after the stop before.
  byStop?: boolean;
  defects?: (items: ChecklistItem[]) => ChecklistItem[];
  // Answer the first item again at the end: the driver went back.
  goBack?: boolean;
  submit?: boolean;
}

describe('the supervisor list: filters, sorts, keyset pages, CSV, and the detail timeline and flags', () => {
  const { t, tokens } = suiteApp();
  let second: string;
  let vehicleId: string;
  const byName: Record<string, InspectionResponse> = {};
  let base: number;

  async function walk(vehicle: string, w: Walk): Promise<InspectionResponse> {
    const started = await startInspection(t.url, w.token, {
      vehicleIds: [vehicle],
      kind: w.kind,
      startedAt: new Date(w.startedAt).toISOString(),
    });
    const gap = w.gapMs ?? 6000;
    const bad = new Set((w.defects?.(started.checklist.items) ?? []).map((i) => i.key));
    const stopIndex = new Map(started.checklist.stops.map((stop, index) => [stop.key, index]));
    const results: ResultUpsert[] = started.checklist.items.map((item, index) => ({
      itemKey: item.key,
      answer: bad.has(item.key) ? 'defect' : 'pass',
      answeredAt: new Date(w.startedAt + ((w.byStop ? stopIndex.get(item.stopKey)! : index) + 1) * gap).toISOString(),
      clientId: randomUUID(),
    }));
    if (w.goBack) {
      const first = started.checklist.items[0]!;
      results[0] = { ...results[0]!, answeredAt: new Date(w.startedAt + (results.length + 2) * gap).toISOString() };
      expect(first.zone).toBe(started.checklist.zones[0]!.key);
    }
    const put = await request(t.url)
      .put(`/api/inspections/${started.id}/results`)
      .set(bearer(w.token))
      .send({ results });
    expect(put.status).toBe(200);
    if (w.submit === false) return started;
    const submitted = await request(t.url)
      .post(`/api/inspections/${started.id}/submit`)
      .set(bearer(w.token))
      .send({ signature: { name: 'Signed' } });
    expect(submitted.status).toBe(200);
    return bodyOf<InspectionResponse>(submitted);
  }

  const mudflap = (items: ChecklistItem[]) => [items.find((i) => !i.safety && i.expects.type === 'check')!];

  beforeAll(async () => {
    second = await signIn(t.url, SECOND_DRIVER);
    vehicleId = (await newTractor(t.url, tokens.admin, 'LS')).id;
    base = Date.now() - 60 * MINUTE;
    // Submitted in the order rushed, late, first, recurring; started in another order.
    // Both answered stop by stop: the rushed one at 3 s a stop, the late one at a quick but fair 10 s.
    const walks: [string, Walk][] = [
      ['rushed', { token: second, kind: 'post_trip', startedAt: base + MINUTE, gapMs: 3000, byStop: true }],
      ['late', { token: second, kind: 'pre_trip', startedAt: base + 5 * MINUTE, gapMs: 10_000, byStop: true }],
      [
        'first',
        { token: tokens.driver, kind: 'pre_trip', startedAt: base + 2 * MINUTE, defects: mudflap, goBack: true },
      ],
      ['open', { token: tokens.driver, kind: 'en_route', startedAt: base + 4 * MINUTE, submit: false }],
    ];
    for (const [name, w] of walks) byName[name] = await walk(vehicleId, w);
    // Started after the first report was submitted, with the same defect on the same vehicle. A whole
    // walk-around at 6 s an item takes longer than the server lets answers run ahead of its clock, so
    // the first report's defect is dated 20 minutes back and this walk-around starts 17 minutes ago.
    await t.dataSource.query(
      `UPDATE defects SET created_at = created_at - interval '20 minutes' WHERE inspection_id = $1`,
      [byName.first!.id],
    );
    byName.recurring = await walk(vehicleId, {
      token: tokens.driver,
      kind: 'pre_trip',
      startedAt: Date.now() - 17 * MINUTE,
      defects: (items) => {
        const same = items.filter((i) => i.key === byName.first!.defects[0]!.itemKey);
        expect(same).toHaveLength(1);
        return same;
      },
    });
  });

  async function page(query: string, token = tokens.supervisor): Promise<InspectionPage> {
    const response = await request(t.url).get(`/api/inspections?vehicleId=${vehicleId}&${query}`).set(bearer(token));
    expect(response.status).toBe(200);
    return bodyOf<InspectionPage>(response);
  }
  const names = (items: InspectionListItem[]) =>
    items.map((i) => Object.entries(byName).find(([, v]) => v.id === i.id)?.[0] ?? i.id);
  async function listed(query: string, token?: string): Promise<string[]> {
    return names((await page(query, token)).items);
  }

  // Every page of a query, following cursors.
  async function allPages(query: string, limit: number): Promise<{ ids: string[]; pages: number }> {
    const ids: string[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const p = await page(`${query}&limit=${limit}${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`);
      expect(p.items.length).toBeLessThanOrEqual(limit);
      ids.push(...p.items.map((i) => i.id));
      cursor = p.nextCursor;
      pages += 1;
    } while (cursor && pages < 20);
    return { ids, pages };
  }

  it('lists newest first by default and sorts by start or submission either way', async () => {
    expect(await listed('')).toEqual(['recurring', 'late', 'open', 'first', 'rushed']);
    expect(await listed('sort=startedAt&order=asc')).toEqual(['rushed', 'first', 'open', 'late', 'recurring']);
    // Sorting by submission leaves out the walk-around still in progress.
    expect(await listed('sort=submittedAt')).toEqual(['recurring', 'first', 'late', 'rushed']);
    expect(await listed('sort=submittedAt&order=asc')).toEqual(['rushed', 'late', 'first', 'recurring']);
  });

  it('filters by driver, kind, status, defects, rushed and time', async () => {
    const driverId = byName.first!.driver.id;
    expect(await listed(`driverId=${driverId}`)).toEqual(['recurring', 'open', 'first']);
    expect(await listed('kind=pre_trip')).toEqual(['recurring', 'late', 'first']);
    expect(await listed('kind=post_trip')).toEqual(['rushed']);
    expect(await listed('status=in_progress')).toEqual(['open']);
    expect(await listed('hasDefects=true')).toEqual(['recurring', 'first']);
    expect(await listed('hasDefects=false')).toEqual(['late', 'open', 'rushed']);
    expect(await listed('rushed=true')).toEqual(['rushed']);
    expect(await listed('rushed=false')).toEqual(['recurring', 'late', 'open', 'first']);
    const mid = encodeURIComponent(new Date(base + 3 * MINUTE).toISOString());
    expect(await listed(`from=${mid}`)).toEqual(['recurring', 'late', 'open']);
    expect(await listed(`to=${mid}`)).toEqual(['first', 'rushed']);
    expect(await listed(`to=${mid}&from=${encodeURIComponent(new Date(base).toISOString())}&rushed=false`)).toEqual([
      'first',
    ]);
    // A bare date is a whole day of the organisation's time zone (UTC here): `to` includes it.
    const day = new Date(byName.recurring!.startedAt).toISOString().slice(0, 10);
    expect(await listed(`to=${day}`)).toContain('recurring');
    const tomorrow = new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
    expect(await listed(`from=${tomorrow}`)).toEqual([]);
  });

  it('gives each row its duration and recurring flag', async () => {
    const items = (await page('')).items;
    const recurring = items.find((i) => i.id === byName.recurring!.id)!;
    const first = items.find((i) => i.id === byName.first!.id)!;
    expect(recurring.recurringDefect).toBe(true);
    expect(first.recurringDefect).toBe(false);
    const count = byName.first!.checklist.items.length;
    // The first report went back to its first item at the end: (count + 2) gaps of 6 s.
    expect(first.durationSeconds).toBe((count + 2) * 6);
    expect(items.find((i) => i.id === byName.open!.id)!.durationSeconds).toBeNull();
    const [row] = await t.dataSource.query<{ recurring_defect: boolean; duration_seconds: number }[]>(
      'SELECT recurring_defect, duration_seconds FROM inspections WHERE id = $1',
      [byName.recurring!.id],
    );
    expect(row).toEqual({ recurring_defect: true, duration_seconds: recurring.durationSeconds });
  });

  it.each([
    ['(newest first)', 2],
    ['sort=startedAt&order=asc', 2],
    ['sort=submittedAt', 3],
    ['sort=submittedAt&order=asc', 1],
    ['driverId=DRIVER&order=asc', 1],
  ])('pages %s without duplicates or gaps (limit %i)', async (query, limit) => {
    const q = query.replace('(newest first)', '').replace('DRIVER', byName.first!.driver.id);
    const whole = (await page(q)).items.map((i) => i.id);
    const { ids, pages } = await allPages(q, limit);
    expect(ids).toEqual(whole);
    expect(new Set(ids).size).toBe(ids.length);
    expect(pages).toBe(Math.max(1, Math.ceil(whole.length / limit)));
  });

  it('pages exactly when start times differ only in microseconds', async () => {
    const vehicle = (await newTractor(t.url, tokens.admin, 'LM')).id;
    const ids: string[] = [];
    for (let n = 0; n < 4; n += 1) {
      ids.push((await startInspection(t.url, tokens.driver, { vehicleIds: [vehicle], kind: 'post_trip' })).id);
    }
    // Written by another tool: the same millisecond, microseconds apart.
    for (const [n, id] of ids.entries()) {
      await t.dataSource.query(
        `UPDATE inspections SET started_at = '2026-11-20T08:00:00.123000Z'::timestamptz + make_interval(secs => $2 / 1e6) WHERE id = $1`,
        [id, n * 100],
      );
    }
    const expected = [...ids].reverse();
    for (const order of ['desc', 'asc'] as const) {
      const seen: string[] = [];
      let cursor: string | null = null;
      do {
        const response: request.Response = await request(t.url)
          .get(`/api/inspections?vehicleId=${vehicle}&order=${order}&limit=1${cursor ? `&cursor=${cursor}` : ''}`)
          .set(bearer(tokens.supervisor));
        const p: InspectionPage = bodyOf<InspectionPage>(response);
        seen.push(...p.items.map((i) => i.id));
        cursor = p.nextCursor;
      } while (cursor && seen.length < 10);
      expect(seen).toEqual(order === 'desc' ? expected : ids);
    }
  });

  it('refuses a cursor from another sort, and wrong filters, naming the field', async () => {
    const first = await page('limit=1');
    const response = await request(t.url)
      .get(`/api/inspections?sort=submittedAt&cursor=${encodeURIComponent(first.nextCursor!)}`)
      .set(bearer(tokens.supervisor));
    expect(response.status).toBe(400);
    expect(errorBody(response).fields?.[0]?.field).toBe('cursor');
    for (const [query, field] of [
      ['sort=odometer', 'sort'],
      ['order=sideways', 'order'],
      ['rushed=maybe', 'rushed'],
      ['from=last-week', 'from'],
    ] as const) {
      const bad = await request(t.url).get(`/api/inspections?${query}`).set(bearer(tokens.supervisor));
      expect(bad.status).toBe(400);
      expect(errorBody(bad).fields?.map((f) => f.field)).toEqual([field]);
    }
  });

  it('shows a driver only their own walk-arounds', async () => {
    expect(await listed('', second)).toEqual(['late', 'rushed']);
  });

  it('exports the same rows as CSV for the same filters, quoting commas and quotes', async () => {
    const users = bodyOf<UserSummary[]>(await request(t.url).get('/api/users').set(bearer(tokens.admin)));
    const tomas = users.find((u) => u.email === SECOND_DRIVER)!;
    const rename = (name: string) =>
      request(t.url).patch(`/api/users/${tomas.id}`).set(bearer(tokens.admin)).send({ name });
    expect((await rename('Reyes, Tomás "Tom"')).status).toBe(200);
    try {
      for (const query of ['', 'sort=submittedAt&order=asc', 'hasDefects=false']) {
        const response = await request(t.url)
          .get(`/api/inspections/export.csv?vehicleId=${vehicleId}&${query}`)
          .set(bearer(tokens.supervisor))
          .buffer(true)
          .parse((res, done) => {
            let text = '';
            res.setEncoding('utf8');
            res.on('data', (chunk: string) => (text += chunk));
            res.on('end', () => done(null, text));
          });
        expect(response.status).toBe(200);
        expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
        expect(response.headers['content-disposition']).toMatch(
          /^attachment; filename="inspections-\d{4}-\d{2}-\d{2}\.csv"$/,
        );
        const text = response.body as string;
        expect(text.startsWith('\uFEFF')).toBe(true);
        const lines = text.slice(1).split('\r\n');
        expect(lines[0]).toBe('date,units,driver,kind,status,duration_minutes,defects,rushed,recurring,inspection_id');
        expect(lines[lines.length - 1]).toBe('');
        const rows = lines.slice(1, -1);
        const items = (await page(query)).items;
        expect(rows.map((line) => line.split(',').at(-1))).toEqual(items.map((i) => i.id));
        const rushed = items.find((i) => i.id === byName.rushed!.id);
        if (rushed) {
          const unitNumber = rushed.vehicles[0]!.unitNumber;
          expect(rows).toContain(
            `${rushed.startedAt},${unitNumber},"Reyes, Tomás ""Tom""",post_trip,submitted,${(rushed.durationSeconds! / 60).toFixed(1)},0,yes,no,${rushed.id}`,
          );
        }
      }
    } finally {
      await rename(tomas.name);
    }
  });

  it('refuses the CSV to drivers and refuses a wrong filter with a plain 400', async () => {
    expect((await request(t.url).get('/api/inspections/export.csv').set(bearer(tokens.driver))).status).toBe(403);
    const bad = await request(t.url).get('/api/inspections/export.csv?kind=joyride').set(bearer(tokens.admin));
    expect(bad.status).toBe(400);
    expect(errorBody(bad).fields?.[0]?.field).toBe('kind');
  });

  it('gives the detail the route as walked, with time per stretch', async () => {
    const detail = bodyOf<InspectionResponse>(
      await request(t.url).get(`/api/inspections/${byName.first!.id}`).set(bearer(tokens.supervisor)),
    );
    const { timeline, checklist } = detail;
    // Zones in route order, then back to the first zone at the end.
    const routeZones = [...new Set(checklist.items.map((i) => i.zone))];
    expect(timeline.map((v) => v.zone)).toEqual([...routeZones, routeZones[0]]);
    expect(timeline.reduce((sum, v) => sum + v.seconds, 0)).toBe(detail.durationSeconds);
    expect(timeline.reduce((sum, v) => sum + v.answerCount, 0)).toBe(checklist.items.length);
    // Back to the first item two gaps after the last answer before it.
    expect(timeline[timeline.length - 1]).toMatchObject({ answerCount: 1, seconds: 12 });
    expect(Date.parse(timeline[1]!.firstAnsweredAt)).toBeGreaterThan(Date.parse(timeline[0]!.lastAnsweredAt));
    expect(timeline[0]!.title).toBe(checklist.zones[0]!.title);
  });

  it('flags a rushed walk-around with why, and a recurring defect naming the earlier report', async () => {
    const get = async (name: string) =>
      bodyOf<InspectionResponse>(
        await request(t.url).get(`/api/inspections/${byName[name]!.id}`).set(bearer(tokens.supervisor)),
      );
    // Judged per stop (our own practice): at least 7.5 s a stop and a median gap of 5 s.
    const rushed = await get('rushed');
    expect(rushed.flags.rushed).toEqual({
      reasons: ['median_gap', 'total_duration'],
      answeredCount: rushed.checklist.items.length,
      answeredStopCount: rushed.checklist.stops.length,
      secondsPerStop: 3,
      medianGapSeconds: 3,
      minimumSecondsPerStop: 7.5,
      minimumMedianGapSeconds: 5,
    });
    expect(rushed.checklist.stops.length).toBeLessThan(rushed.checklist.items.length);
    expect(rushed.flags.recurring).toEqual([]);
    // 10 s a stop is well under 3 s an item, and not rushed.
    const late = await get('late');
    expect(late.durationSeconds! / late.checklist.items.length).toBeLessThan(3);
    expect(late.flags.rushed).toBeNull();
    const first = await get('first');
    expect(first.flags).toEqual({ rushed: null, recurring: [] });
    const recurring = await get('recurring');
    expect(recurring.flags.rushed).toBeNull();
    expect(recurring.flags.recurring).toHaveLength(1);
    expect(recurring.flags.recurring[0]).toMatchObject({
      vehicleId,
      itemKey: first.defects[0]!.itemKey,
      title: first.defects[0]!.title,
      earlierCount: 1,
      earlier: { inspectionId: first.id, defectId: first.defects[0]!.id, state: 'open', certifiedAt: null },
    });
  });
});
