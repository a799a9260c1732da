import {
  OFFLINE_WINDOW_DAYS,
  type ChecklistItem,
  type FleetBoard,
  type InspectionPage,
  type InspectionResponse,
  type ResultUpsert,
  type UserSummary,
  type VehicleResponse,
} from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { DEMO_PASSWORD } from '../src/database/seed-data';
import {
  answerAndSubmit,
  bearer,
  binary,
  bodyOf,
  errorBody,
  newTractor,
  postInspection,
  ROLE_EMAILS,
  startInspection,
  suiteApp,
  tractorRequest,
  unitNumber,
} from './helpers';
import { pdfText } from './pdf-text';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

// A 400 naming exactly one field, with a message that says what is wrong with it.
function expectOnlyField(response: request.Response, field: string, says: RegExp): void {
  const fields = errorBody(response).fields ?? [];
  expect(fields.map((f) => f.field)).toEqual([field]);
  expect(fields[0]?.message).toMatch(says);
}

describe('hardening', () => {
  const { t, tokens } = suiteApp();

  const vehicle = (id: string) => request(t.url).get(`/api/vehicles/${id}`).set(bearer(tokens.supervisor));
  const patchVehicle = (id: string, body: object, token = tokens.supervisor) =>
    request(t.url).patch(`/api/vehicles/${id}`).set(bearer(token)).send(body);

  function answers(started: InspectionResponse, defects: (items: ChecklistItem[]) => ChecklistItem[]): ResultUpsert[] {
    const bad = new Set(defects(started.checklist.items).map((i) => i.key));
    const startMs = Date.parse(started.startedAt);
    return started.checklist.items.map((item, index) => ({
      itemKey: item.key,
      answer: bad.has(item.key) ? 'defect' : 'pass',
      answeredAt: new Date(startMs + (index + 1) * 6000).toISOString(),
      clientId: randomUUID(),
    }));
  }

  // A signed walk-around of one unit with one safety defect: the unit goes out of service.
  async function reportSafetyDefect(vehicleId: string, startedAt = new Date(Date.now() - HOUR).toISOString()) {
    const started = await startInspection(t.url, tokens.driver, { vehicleIds: [vehicleId], startedAt });
    const results = answers(started, (items) =>
      items.filter((i) => i.safety && i.expects.type === 'check').slice(0, 1),
    );
    return answerAndSubmit(t.url, tokens.driver, started.id, results);
  }

  async function certify(defectId: string) {
    const response = await request(t.url)
      .post(`/api/defects/${defectId}/repair`)
      .set(bearer(tokens.mechanic))
      .send({ action: 'repaired', note: 'Replaced the part', signature: { name: 'Priya Natarajan' } });
    expect(response.status).toBe(201);
  }

  describe('the out-of-service hold', () => {
    it('refuses to put a unit with an open safety defect back in service by hand, saying why', async () => {
      const tractor = await newTractor(t.url, tokens.admin, 'HD');
      const report = await reportSafetyDefect(tractor.id);
      for (const token of [tokens.supervisor, tokens.admin]) {
        const lifted = await patchVehicle(tractor.id, { status: 'in_service' }, token);
        expect(lifted.status).toBe(409);
        expect(errorBody(lifted).message).toMatch(/stays out of service: it has 1 open safety defect/);
        expect(errorBody(lifted).message).toMatch(/repair certification.*49 CFR 396\.11\(a\)\(3\)/);
      }
      expect(bodyOf<VehicleResponse>(await vehicle(tractor.id)).status).toBe('out_of_service');
      // The certification lifts it.
      await certify(report.defects[0]!.id);
      expect(bodyOf<VehicleResponse>(await vehicle(tractor.id))).toMatchObject({
        status: 'in_service',
        statusReason: null,
      });
    });

    it('lets a supervisor take a unit out of service by hand only with a reason, shown on the fleet board', async () => {
      const tractor = await newTractor(t.url, tokens.admin, 'HH');
      const bare = await patchVehicle(tractor.id, { status: 'out_of_service' });
      expect(bare.status).toBe(400);
      expectOnlyField(bare, 'statusReason', /Say why/);
      const held = await patchVehicle(tractor.id, {
        status: 'out_of_service',
        statusReason: '  Annual inspection due ',
      });
      expect(held.status).toBe(200);
      expect(bodyOf<VehicleResponse>(held)).toMatchObject({
        status: 'out_of_service',
        statusReason: 'Annual inspection due',
      });
      const board = bodyOf<FleetBoard>(await request(t.url).get('/api/fleet/board').set(bearer(tokens.supervisor)));
      expect(board.vehicles.find((v) => v.id === tractor.id)).toMatchObject({
        status: 'out_of_service',
        statusReason: 'Annual inspection due',
        openSafetyDefects: [],
      });
      // A hold put by hand is lifted by hand.
      const lifted = await patchVehicle(tractor.id, { status: 'in_service' });
      expect(bodyOf<VehicleResponse>(lifted)).toMatchObject({ status: 'in_service', statusReason: null });
    });

    it('keeps a hold put by hand when the defects are certified, and a new unit out of service needs a reason', async () => {
      const tractor = await newTractor(t.url, tokens.admin, 'HB');
      const report = await reportSafetyDefect(tractor.id);
      const held = await patchVehicle(tractor.id, {
        status: 'out_of_service',
        statusReason: 'Waiting for the body shop',
      });
      expect(bodyOf<VehicleResponse>(held).statusReason).toMatch(/^Waiting for the body shop\. Open safety defect: /);
      await certify(report.defects[0]!.id);
      expect(bodyOf<VehicleResponse>(await vehicle(tractor.id))).toMatchObject({
        status: 'out_of_service',
        statusReason: 'Waiting for the body shop',
      });
      const created = await request(t.url)
        .post('/api/vehicles')
        .set(bearer(tokens.admin))
        .send(tractorRequest(unitNumber('HN'), { status: 'out_of_service' }));
      expect(created.status).toBe(400);
      expect(errorBody(created).fields?.[0]?.field).toBe('statusReason');
    });
  });

  describe('plausible times', () => {
    let tractorId: string;
    beforeAll(async () => {
      tractorId = (await newTractor(t.url, tokens.admin, 'TM')).id;
    });

    it(`refuses a start in the future or more than ${OFFLINE_WINDOW_DAYS} days ago, naming startedAt`, async () => {
      const cases: [string, RegExp][] = [
        ['2001-06-01T08:00:00.000Z', /more than 14 days ago/],
        [new Date(Date.now() - (OFFLINE_WINDOW_DAYS + 1) * DAY).toISOString(), /more than 14 days ago/],
        [new Date(Date.now() + HOUR).toISOString(), /in the future by the server's clock/],
        ['9999-12-31T23:59:59.000Z', /in the future/],
      ];
      for (const [startedAt, says] of cases) {
        const response = await postInspection(t.url, tokens.driver, { vehicleIds: [tractorId], startedAt });
        expect({ startedAt, status: response.status }).toEqual({ startedAt, status: 400 });
        expectOnlyField(response, 'startedAt', says);
      }
    });

    it('accepts a walk-around started offline days ago, and keeps the time the server received its answers', async () => {
      const startedAt = new Date(Date.now() - 3 * DAY).toISOString();
      const started = await startInspection(t.url, tokens.driver, { vehicleIds: [tractorId], startedAt });
      const item = started.checklist.items[0]!;
      const answeredAt = new Date(Date.parse(startedAt) + 60_000).toISOString();
      const put = await request(t.url)
        .put(`/api/inspections/${started.id}/results`)
        .set(bearer(tokens.driver))
        .send({ results: [{ itemKey: item.key, answer: 'pass', answeredAt, clientId: randomUUID() }] });
      expect(put.status).toBe(200);
      const [row] = await t.dataSource.query<{ answered_at: Date; received_at: Date }[]>(
        'SELECT answered_at, received_at FROM item_results WHERE inspection_id = $1',
        [started.id],
      );
      expect(row!.answered_at.toISOString()).toBe(answeredAt);
      expect(Math.abs(row!.received_at.getTime() - Date.now())).toBeLessThan(60_000);
      const [inspection] = await t.dataSource.query<{ created_at: Date }[]>(
        'SELECT created_at FROM inspections WHERE id = $1',
        [started.id],
      );
      expect(Math.abs(inspection!.created_at.getTime() - Date.now())).toBeLessThan(60_000);
    });

    it('refuses an answer dated in the future or before its walk-around started, naming the answer', async () => {
      const started = await startInspection(t.url, tokens.driver, {
        vehicleIds: [tractorId],
        startedAt: new Date(Date.now() - HOUR).toISOString(),
      });
      const item = started.checklist.items[0]!;
      const put = (answeredAt: string) =>
        request(t.url)
          .put(`/api/inspections/${started.id}/results`)
          .set(bearer(tokens.driver))
          .send({ results: [{ itemKey: item.key, answer: 'pass', answeredAt, clientId: randomUUID() }] });
      const future = await put('9999-12-31T23:59:59.000Z');
      expect(future.status).toBe(400);
      expectOnlyField(future, 'results.0.answeredAt', /in the future by the server's clock/);
      const early = await put(new Date(Date.now() - 2 * HOUR).toISOString());
      expect(early.status).toBe(400);
      expectOnlyField(early, 'results.0.answeredAt', /before this walk-around started/);
      // A phone clock a little ahead of the server's is within the skew, and a later answer still corrects it.
      expect((await put(new Date(Date.now() + 2 * 60_000).toISOString())).status).toBe(200);
      expect((await put(new Date(Date.now() + 3 * 60_000).toISOString())).status).toBe(200);
    });
  });

  describe('body size', () => {
    it("accepts a 500-answer batch with every text at its longest, the API's own maximum", async () => {
      const tractor = await newTractor(t.url, tokens.admin, 'BL');
      const started = await startInspection(t.url, tokens.driver, {
        vehicleIds: [tractor.id],
        startedAt: new Date(Date.now() - HOUR).toISOString(),
      });
      const items = started.checklist.items;
      // Three bytes each in UTF-8: the longest a 2,000-character text can be.
      const longText = '轮'.repeat(2000);
      const results = Array.from({ length: 500 }, (_, index) => ({
        itemKey: items[index % items.length]!.key,
        answer: 'pass',
        detail: longText,
        heard: longText,
        confidence: 0.123456789,
        answeredAt: new Date(Date.now() - HOUR + index * 1000).toISOString(),
        clientId: `${randomUUID()}-${'c'.repeat(27)}`,
      }));
      const body = JSON.stringify({ results });
      expect(Buffer.byteLength(body)).toBeGreaterThan(6_000_000);
      const response = await request(t.url)
        .put(`/api/inspections/${started.id}/results`)
        .set(bearer(tokens.driver))
        .set('Content-Type', 'application/json')
        .send(body);
      expect(response.status).toBe(200);
    });

    it('accepts a signature drawing of 150,000 characters', async () => {
      const tractor = await newTractor(t.url, tokens.admin, 'SG');
      const started = await startInspection(t.url, tokens.driver, {
        vehicleIds: [tractor.id],
        startedAt: new Date(Date.now() - HOUR).toISOString(),
      });
      const put = await request(t.url)
        .put(`/api/inspections/${started.id}/results`)
        .set(bearer(tokens.driver))
        .send({ results: answers(started, () => []) });
      expect(put.status).toBe(200);
      let drawing = 'M10 10';
      for (let i = 0; drawing.length < 150_000; i += 1) drawing += ` L${10 + (i % 200)} ${10 + (i % 50)}`;
      drawing = drawing.slice(0, 150_000).replace(/\s\S*$/, '');
      expect(drawing.length).toBeGreaterThan(149_990);
      const submitted = await request(t.url)
        .post(`/api/inspections/${started.id}/submit`)
        .set(bearer(tokens.driver))
        .send({ signature: { name: 'Dana Okafor', drawing } });
      expect(submitted.status).toBe(200);
    });

    it('answers 413 naming the limit for a body over it', async () => {
      const response = await request(t.url)
        .post('/api/auth/login')
        .set('Content-Type', 'application/json')
        .send(JSON.stringify({ email: 'a@b.test', password: 'x'.repeat(7 * 1024 * 1024) }));
      expect(response.status).toBe(413);
      expect(errorBody(response).message).toBe(
        'The request body is larger than 7 MB (7340032 bytes), the most this API accepts: send fewer results at a time.',
      );
    });
  });

  describe('sign-in limits', () => {
    const attempt = (email: string, password: string, client: string) =>
      request(t.url).post('/api/auth/login').set('X-Forwarded-For', client).send({ email, password });

    it('limits failed sign-ins from one client across many addresses, not other clients', async () => {
      const client = '203.0.113.7';
      for (let i = 0; i < 20; i += 1) {
        const response = await attempt(`nobody-${i}@yardcall.test`, 'wrong', client);
        expect(response.status).toBe(401);
      }
      const blocked = await attempt(ROLE_EMAILS.trainer, DEMO_PASSWORD, client);
      expect(blocked.status).toBe(429);
      expect(errorBody(blocked).message).toMatch(
        /^Too many sign-in attempts from this device or network\. Try again in \d+ seconds?\.$/,
      );
      expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
      expect((await attempt(ROLE_EMAILS.trainer, DEMO_PASSWORD, '203.0.113.8')).status).toBe(200);
    });

    it('clears the count of an address on a successful sign-in', async () => {
      const client = '203.0.113.20';
      for (let round = 0; round < 2; round += 1) {
        for (let i = 0; i < 4; i += 1) {
          expect((await attempt(ROLE_EMAILS.mechanic, `wrong-${round}-${i}`, client)).status).toBe(401);
        }
        const right = await attempt(ROLE_EMAILS.mechanic, DEMO_PASSWORD, client);
        expect(right.status).toBe(200);
      }
    });
  });

  describe('organisation time zone', () => {
    afterAll(async () => {
      // The demo organisation is shared by the other suites: back to UTC.
      await request(t.url).patch('/api/organizations/time-zone').set(bearer(tokens.admin)).send({ timeZone: 'UTC' });
    });

    it('is an admin setting, an IANA name checked and stored in its canonical spelling', async () => {
      const set = (timeZone: unknown, token = tokens.admin) =>
        request(t.url).patch('/api/organizations/time-zone').set(bearer(token)).send({ timeZone });
      const wrong = await set('Mars/Olympus_Mons');
      expect(wrong.status).toBe(400);
      expectOnlyField(wrong, 'timeZone', /is not a time zone name this server knows/);
      expect((await set('+05:00')).status).toBe(400);
      expect((await set('America/Chicago', tokens.supervisor)).status).toBe(403);
      const ok = await set('america/chicago');
      expect(ok.status).toBe(200);
      expect(ok.body).toEqual({ timeZone: 'America/Chicago' });
      const read = await request(t.url).get('/api/organizations/time-zone').set(bearer(tokens.driver));
      expect(read.body).toEqual({ timeZone: 'America/Chicago' });
    });

    it("reads the supervisor's days and the report's times in the organisation's zone", async () => {
      await request(t.url)
        .patch('/api/organizations/time-zone')
        .set(bearer(tokens.admin))
        .send({ timeZone: 'America/Chicago' });
      const tractor = await newTractor(t.url, tokens.admin, 'TZ');
      // 02:30 UTC yesterday: still the day before in Chicago (UTC-6 or -5).
      const utcDay = new Date(Date.now() - DAY).toISOString().slice(0, 10);
      const startedAt = `${utcDay}T02:30:00.000Z`;
      const chicagoDay = new Date(Date.parse(startedAt) - 6 * HOUR).toISOString().slice(0, 10);
      const started = await startInspection(t.url, tokens.driver, { vehicleIds: [tractor.id], startedAt });
      const ids = async (day: string) =>
        bodyOf<InspectionPage>(
          await request(t.url)
            .get('/api/inspections')
            .query({ vehicleId: tractor.id, from: day, to: day })
            .set(bearer(tokens.supervisor)),
        ).items.map((i) => i.id);
      expect(await ids(chicagoDay)).toEqual([started.id]);
      expect(await ids(utcDay)).toEqual([]);

      const pdf = await binary(
        request(t.url).get(`/api/inspections/${started.id}/report.pdf`).set(bearer(tokens.supervisor)),
      );
      expect(pdf.status).toBe(200);
      const { text } = await pdfText(pdf.body as Buffer);
      expect(text).toMatch(new RegExp(`Started: ${chicagoDay} 2[01]:30 C[SD]T`));
    });
  });

  describe('requests the contract does not allow', () => {
    it('refuses null where the contract has none, naming the field', async () => {
      const me = bodyOf<UserSummary>(await request(t.url).get('/api/auth/me').set(bearer(tokens.driver)));
      const name = await request(t.url).patch(`/api/users/${me.id}`).set(bearer(tokens.admin)).send({ name: null });
      expect(name.status).toBe(400);
      expectOnlyField(name, 'name', /cannot be null/);
      const scale = await request(t.url)
        .patch('/api/auth/me/settings')
        .set(bearer(tokens.driver))
        .send({ textScale: null });
      expect(scale.status).toBe(400);
      expectOnlyField(scale, 'textScale', /cannot be null/);
      const after = bodyOf<UserSummary>(await request(t.url).get('/api/auth/me').set(bearer(tokens.driver)));
      expect(after.settings.textScale).toBe(me.settings.textScale);
    });

    it('refuses NUL characters and unpaired surrogates in nested text, naming the field', async () => {
      const tractor = await newTractor(t.url, tokens.admin, 'NU');
      const started = await startInspection(t.url, tokens.driver, {
        vehicleIds: [tractor.id],
        startedAt: new Date(Date.now() - HOUR).toISOString(),
      });
      const result = { itemKey: started.checklist.items[0]!.key, answer: 'pass', answeredAt: new Date().toISOString() };
      const nul = await request(t.url)
        .put(`/api/inspections/${started.id}/results`)
        .set(bearer(tokens.driver))
        .send({ results: [{ ...result, clientId: 'a\u0000b' }] });
      expect(nul.status).toBe(400);
      expectOnlyField(nul, 'results.0.clientId', /NUL/);
      const surrogate = await request(t.url)
        .post(`/api/inspections/${started.id}/submit`)
        .set(bearer(tokens.driver))
        .send({ signature: { name: 'Dana \udc00Okafor' } });
      expect(surrogate.status).toBe(400);
      expectOnlyField(surrogate, 'signature.name', /unpaired UTF-16 surrogate/);
    });

    it('refuses a crafted cursor on the list and on the CSV export', async () => {
      const cursor = Buffer.from(
        '["startedAt","desc","2026-02-31T05:40:00.000Z","0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c"]',
      );
      for (const path of ['/api/inspections', '/api/inspections/export.csv']) {
        const response = await request(t.url)
          .get(path)
          .query({ cursor: cursor.toString('base64url') })
          .set(bearer(tokens.supervisor));
        expect({ path, status: response.status }).toEqual({ path, status: 400 });
        expect(errorBody(response).fields?.[0]?.field).toBe('cursor');
      }
    });
  });

  describe('headers', () => {
    it('marks signed-in answers no-store and sends HSTS only over TLS', async () => {
      const plain = await request(t.url).get('/api/auth/me').set(bearer(tokens.driver));
      expect(plain.headers['cache-control']).toBe('no-store');
      expect(plain.headers['strict-transport-security']).toBeUndefined();
      // A TLS-terminating proxy on the same machine says so.
      const tls = await request(t.url).get('/api/auth/me').set(bearer(tokens.driver)).set('X-Forwarded-Proto', 'https');
      expect(tls.headers['strict-transport-security']).toMatch(/^max-age=\d+/);
    });
  });
});
