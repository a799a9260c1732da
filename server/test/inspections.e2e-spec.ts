import type {
  ChecklistItem,
  DefectResponse,
  InspectionPage,
  InspectionResponse,
  PendingAcknowledgement,
  PutResultsResponse,
  ResultUpsert,
  SignatureResponse,
  VehicleRequest,
  VehicleResponse,
} from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import {
  bearer,
  bodyOf,
  createdBody,
  createVehicle,
  errorBody,
  OTHER_ORG_ADMIN,
  postInspection,
  SECOND_DRIVER,
  signIn,
  suiteApp,
  tractorRequest,
  trailerRequest,
  unitNumber,
} from './helpers';

// A unit number free in this run, so the suite also passes against a database kept from an earlier run.

const steerTread = (items: ChecklistItem[]) =>
  items.find(
    (i) => i.expects.type === 'measure' && i.expects.quantity === 'tread_depth' && i.limitContext?.axle === 'steer',
  )!;
const nonSafetyCheck = (items: ChecklistItem[]) => items.find((i) => !i.safety && i.expects.type === 'check')!;

describe('inspections and defects', () => {
  const { t, tokens } = suiteApp();
  let secondDriver: string;
  let otherAdmin: string;
  // Each walk-around starts a minute after the one before, so lists have a known order.
  // Starting two days ago: within the offline window, and a minute apart never reaches the present.
  let clock = Date.now() - 2 * 24 * 3_600_000;
  const nextStart = () => new Date((clock += 60_000)).toISOString();

  beforeAll(async () => {
    secondDriver = await signIn(t.url, SECOND_DRIVER);
    otherAdmin = await signIn(t.url, OTHER_ORG_ADMIN);
  });

  const addVehicle = (body: VehicleRequest) => createVehicle(t.url, tokens.admin, body);

  async function start(
    vehicleIds: string[],
    options: { token?: string; kind?: string; startedAt?: string; clientId?: string } = {},
  ) {
    const { token = tokens.driver, startedAt = nextStart(), ...rest } = options;
    return postInspection(t.url, token, { vehicleIds, startedAt, location: 'Kestrel Valley yard, bay 3', ...rest });
  }

  async function started(vehicleIds: string[], options: Parameters<typeof start>[1] = {}) {
    const response = await start(vehicleIds, options);
    return createdBody<InspectionResponse>(response);
  }

  function answer(item: ChecklistItem, at: string, extra: Partial<ResultUpsert> = {}): ResultUpsert {
    return { itemKey: item.key, answer: 'pass', answeredAt: at, clientId: randomUUID(), ...extra };
  }

  function put(id: string, results: ResultUpsert[], token = tokens.driver) {
    return request(t.url).put(`/api/inspections/${id}/results`).set(bearer(token)).send({ results });
  }

  function submit(id: string, token = tokens.driver) {
    return request(t.url)
      .post(`/api/inspections/${id}/submit`)
      .set(bearer(token))
      .send({ signature: { name: 'Dana Okafor', drawing: 'M10 10 L40 20' }, odometer: 412803 });
  }

  // A walk-around of a new tractor with two defects answered a minute apart: the steer tire's tread read at
  // `treadDepth` 32nds (a safety defect below 4/32), then a non-safety check reported.
  async function withTwoDefects(prefix: string, treadDepth: number, oilAnswer: Partial<ResultUpsert> = {}) {
    const power = await addVehicle(tractorRequest(unitNumber(prefix)));
    const inspection = await started([power.id]);
    const tread = steerTread(inspection.checklist.items);
    const oil = nonSafetyCheck(inspection.checklist.items);
    const at = Date.parse(inspection.startedAt);
    const stored = await put(inspection.id, [
      answer(tread, new Date(at + 60_000).toISOString(), {
        measurement: { quantity: 'tread_depth', value: treadDepth, unit: 'in/32' },
      }),
      answer(oil, new Date(at + 120_000).toISOString(), { answer: 'defect', ...oilAnswer }),
    ]);
    expect(stored.status).toBe(200);
    return { power, inspection, tread, oil, at };
  }

  async function vehicle(id: string): Promise<VehicleResponse> {
    return bodyOf<VehicleResponse>(await request(t.url).get(`/api/vehicles/${id}`).set(bearer(tokens.admin)));
  }

  async function resultRows(inspectionId: string) {
    return t.dataSource.query<{ id: string; item_key: string; client_id: string; answer: string }[]>(
      'SELECT id, item_key, client_id, answer FROM item_results WHERE inspection_id = $1 ORDER BY item_key',
      [inspectionId],
    );
  }

  it('builds the checklist from the power unit and trailer, and a retried create answers the same inspection', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IT')));
    const van = await addVehicle(trailerRequest(unitNumber('IV')));
    const clientId = randomUUID();
    const startedAt = nextStart();
    const first = await start([power.id, van.id], { clientId, startedAt });
    const inspection = createdBody<InspectionResponse>(first);
    expect(inspection.vehicles.map((v) => v.unitNumber)).toEqual([power.unitNumber, van.unitNumber]);
    expect(inspection.status).toBe('in_progress');
    expect(inspection.checklist.items.some((i) => i.unitIndex === 1)).toBe(true);
    expect(inspection.checklist.items[0]?.unitIndex).toBe(0);
    expect(inspection).toMatchObject({ results: [], notes: [], photos: [], defects: [], signatures: [] });

    const retry = await start([power.id, van.id], { clientId, startedAt });
    expect(retry.status).toBe(200);
    expect(bodyOf<InspectionResponse>(retry).id).toBe(inspection.id);
    const [count] = await t.dataSource.query<{ n: number }[]>(
      'SELECT count(*)::int AS n FROM inspections WHERE client_id = $1',
      [clientId],
    );
    expect(count?.n).toBe(1);
  });

  it('keeps the checklist of an inspection when its vehicle is edited later', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IS')));
    const inspection = await started([power.id]);
    const config = tractorRequest('x').config;
    config.axles.push({ ...config.axles[1]!, position: 'drive' });
    const edit = await request(t.url).patch(`/api/vehicles/${power.id}`).set(bearer(tokens.admin)).send({ config });
    expect(edit.status).toBe(200);
    const again = bodyOf<InspectionResponse>(
      await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(tokens.driver)),
    );
    expect(again.checklist.items.map((i) => i.key)).toEqual(inspection.checklist.items.map((i) => i.key));
  });

  it('refuses a combination with the trailer first or two power units, with a sentence', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IC')));
    const power2 = await addVehicle(tractorRequest(unitNumber('ID')));
    const van = await addVehicle(trailerRequest(unitNumber('IW')));
    for (const ids of [
      [van.id, power.id],
      [power.id, power2.id],
    ]) {
      const response = await start(ids);
      expect(response.status).toBe(400);
      expect(errorBody(response).fields).toEqual([
        {
          field: 'vehicleIds',
          message: expect.stringMatching(/only the first vehicle of a combination may be a power unit/) as string,
        },
      ]);
    }
    const empty = await request(t.url).post('/api/inspections').set(bearer(tokens.driver)).send({ kind: 'pre_trip' });
    expect(empty.status).toBe(400);
    expect(errorBody(empty).fields?.map((f) => f.field)).toEqual(
      expect.arrayContaining(['vehicleIds', 'startedAt', 'clientId']),
    );
  });

  it('stores the same batch sent twice as the same rows', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IB')));
    const inspection = await started([power.id]);
    const at = Date.parse(inspection.startedAt);
    const batch = inspection.checklist.items
      .slice(0, 40)
      .map((item, i) => answer(item, new Date(at + 5000 * (i + 1)).toISOString()));
    const first = await put(inspection.id, batch);
    expect(first.status).toBe(200);
    const rowsAfterFirst = await resultRows(inspection.id);
    const second = await put(inspection.id, batch);
    expect(second.status).toBe(200);
    expect(bodyOf<PutResultsResponse>(second)).toEqual(bodyOf<PutResultsResponse>(first));
    expect(await resultRows(inspection.id)).toEqual(rowsAfterFirst);
    expect(rowsAfterFirst).toHaveLength(40);
  });

  it('keeps the latest answer of an item when batches arrive out of order', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IO')));
    const inspection = await started([power.id]);
    const item = nonSafetyCheck(inspection.checklist.items);
    const at = Date.parse(inspection.startedAt);
    const older = answer(item, new Date(at + 10_000).toISOString(), { answer: 'pass' });
    const newer = answer(item, new Date(at + 20_000).toISOString(), { answer: 'defect', detail: 'cap missing' });
    expect((await put(inspection.id, [newer])).status).toBe(200);
    const late = await put(inspection.id, [older]);
    expect(late.status).toBe(200);
    // The response says what is stored: the newer answer.
    expect(bodyOf<PutResultsResponse>(late).results).toEqual([
      expect.objectContaining({ itemKey: item.key, answer: 'defect', clientId: newer.clientId, detail: 'cap missing' }),
    ]);
    const rows = await resultRows(inspection.id);
    expect(rows).toEqual([
      expect.objectContaining({ item_key: item.key, answer: 'defect', client_id: newer.clientId }),
    ]);
    // A later answer replaces an earlier one.
    const latest = answer(item, new Date(at + 30_000).toISOString(), { answer: 'pass' });
    expect(bodyOf<PutResultsResponse>(await put(inspection.id, [latest])).results[0]?.answer).toBe('pass');
  });

  it("corrects a client verdict that contradicts the limit and names the limit's source", async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IL')));
    const inspection = await started([power.id]);
    const item = steerTread(inspection.checklist.items);
    const at = new Date(Date.parse(inspection.startedAt) + 60_000).toISOString();
    const response = await put(inspection.id, [
      answer(item, at, { measurement: { quantity: 'tread_depth', value: 3, unit: 'in/32' }, verdict: 'ok' }),
    ]);
    expect(response.status).toBe(200);
    expect(bodyOf<PutResultsResponse>(response).results[0]).toMatchObject({
      itemKey: item.key,
      verdict: 'out_of_limit',
      measurement: { quantity: 'tread_depth', value: 3, unit: 'in/32' },
      // 49 CFR 393.75(b): at least 4/32 in on a steer tire.
      limit: { value: 4, unit: 'in/32', source: '49 CFR 393.75(b)' },
    });
    // A reading in millimetres is stored in the canonical unit: 3.2 mm is about 4.03/32 in, just inside the limit.
    const mm = await put(inspection.id, [
      answer(item, new Date(Date.parse(at) + 1000).toISOString(), {
        measurement: { quantity: 'tread_depth', value: 3.2, unit: 'mm' },
        verdict: 'out_of_limit',
      }),
    ]);
    const stored = bodyOf<PutResultsResponse>(mm).results[0]!;
    expect(stored.measurement?.unit).toBe('in/32');
    expect(stored.measurement?.value).toBeCloseTo(4.031, 2);
    expect(stored.verdict).not.toBe('out_of_limit');
  });

  it('refuses item keys not on the checklist with a 400 naming them, and stores nothing of the batch', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IK')));
    const inspection = await started([power.id]);
    const at = new Date(Date.parse(inspection.startedAt) + 5000).toISOString();
    const good = answer(inspection.checklist.items[0]!, at);
    const response = await put(inspection.id, [
      good,
      { ...good, itemKey: 'u9.axle7.left.tire.tread', clientId: randomUUID() },
      { ...good, itemKey: 'u1.flux_capacitor', clientId: randomUUID() },
    ]);
    expect(response.status).toBe(400);
    expect(errorBody(response).message).toContain('u9.axle7.left.tire.tread');
    expect(errorBody(response).message).toContain('u1.flux_capacitor');
    expect(errorBody(response).fields?.map((f) => f.field)).toEqual(['results.1.itemKey', 'results.2.itemKey']);
    expect(await resultRows(inspection.id)).toEqual([]);
    const wrongMeasure = await put(inspection.id, [
      { ...good, measurement: { quantity: 'tread_depth', value: 5, unit: 'in/32' } },
    ]);
    expect(wrongMeasure.status).toBe(400);
    expect(errorBody(wrongMeasure).fields?.[0]?.field).toBe('results.0.measurement');
  });

  it("answers 404 for another organisation's inspection and for another driver's", async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IN')));
    const inspection = await started([power.id]);
    const other = await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(otherAdmin));
    expect(other.status).toBe(404);
    expect(errorBody(other).message).toBe('No inspection with this id in your organisation.');
    const otherDriver = await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(secondDriver));
    expect(otherDriver.status).toBe(404);
    const at = new Date(Date.parse(inspection.startedAt) + 5000).toISOString();
    expect((await put(inspection.id, [answer(inspection.checklist.items[0]!, at)], secondDriver)).status).toBe(404);
    expect((await submit(inspection.id, secondDriver)).status).toBe(404);
    const list = bodyOf<InspectionPage>(
      await request(t.url).get(`/api/inspections?vehicleId=${power.id}`).set(bearer(secondDriver)),
    );
    expect(list.items).toEqual([]);
    // The office sees it.
    expect((await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(tokens.supervisor))).status).toBe(
      200,
    );
    const cross = await start([power.id], { token: otherAdmin });
    expect(cross.status).toBe(403);
  });

  it('submits: signs, opens defects, takes the vehicle out of service, and then refuses every change with 409', async () => {
    const { power, inspection, tread, oil, at } = await withTwoDefects('IU', 3, { detail: 'level low' });
    const response = await submit(inspection.id);
    expect(response.status).toBe(200);
    const report = bodyOf<InspectionResponse>(response);
    expect(report.status).toBe('submitted');
    expect(report.submittedAt).not.toBeNull();
    expect(report.odometer).toBe(412803);
    expect(report.defectCount).toBe(2);
    expect(report.defects.map((d) => [d.itemKey, d.safety, d.status])).toEqual(
      expect.arrayContaining([
        [tread.key, true, 'open'],
        [oil.key, false, 'open'],
      ]),
    );
    expect(report.defects.find((d) => d.itemKey === tread.key)?.limit?.source).toBe('49 CFR 393.75(b)');
    expect(report.signatures).toEqual([
      expect.objectContaining({ role: 'driver', name: 'Dana Okafor', hasDrawing: true }),
    ]);
    expect(report.signatures[0]?.statement).toMatch(/^I, Dana Okafor, inspected .* certify/);
    expect(report.summary.mayBeDriven).toBe(false);

    const parked = await vehicle(power.id);
    expect(parked.status).toBe('out_of_service');
    expect(parked.statusReason).toContain(tread.title);
    expect(parked.statusReason).not.toContain(oil.title);

    const edit = await put(inspection.id, [answer(oil, new Date(at + 180_000).toISOString())]);
    expect(edit.status).toBe(409);
    expect(errorBody(edit).message).toMatch(/repair certification and the next driver's acknowledgement/);
    const again = await submit(inspection.id);
    expect(again.status).toBe(409);
  });

  it('certifies repairs: a deferral needs a reason and a future date, a safety defect cannot wait, and the last repair returns the vehicle to service', async () => {
    const { power, inspection, tread, oil } = await withTwoDefects('IR', 2);
    const report = bodyOf<InspectionResponse>(await submit(inspection.id));
    const safety = report.defects.find((d) => d.itemKey === tread.key)!;
    const minor = report.defects.find((d) => d.itemKey === oil.key)!;
    const sign = { name: 'Rui Almeida' };
    const repair = (id: string, body: object, token = tokens.mechanic) =>
      request(t.url).post(`/api/defects/${id}/repair`).set(bearer(token)).send(body);

    const noDate = await repair(minor.id, { action: 'deferred', note: 'Top up at the next service.', signature: sign });
    expect(noDate.status).toBe(400);
    expect(errorBody(noDate).fields).toEqual([
      { field: 'deferredUntil', message: expect.stringMatching(/future/) as string },
    ]);
    const past = await repair(minor.id, {
      action: 'deferred',
      note: 'Top up later.',
      deferredUntil: '2020-01-01T00:00:00.000Z',
      signature: sign,
    });
    expect(past.status).toBe(400);
    const noReason = await repair(minor.id, {
      action: 'deferred',
      note: ' ',
      deferredUntil: new Date(Date.now() + 7 * 86_400_000).toISOString(),
      signature: sign,
    });
    expect(errorBody(noReason).fields?.map((f) => f.field)).toEqual(['note']);
    const waitSafety = await repair(safety.id, {
      action: 'deferred',
      note: 'Tire on order.',
      deferredUntil: new Date(Date.now() + 86_400_000).toISOString(),
      signature: sign,
    });
    expect(waitSafety.status).toBe(400);
    expect(errorBody(waitSafety).fields?.[0]?.field).toBe('action');

    const deferred = await repair(minor.id, {
      action: 'deferred',
      note: 'Top up at the next service.',
      deferredUntil: new Date(Date.now() + 7 * 86_400_000).toISOString(),
      signature: sign,
    });
    expect(deferred.status).toBe(201);
    expect(bodyOf<DefectResponse>(deferred).status).toBe('deferred');
    expect((await vehicle(power.id)).status).toBe('out_of_service');

    const fixed = await repair(safety.id, { action: 'repaired', note: 'Replaced the steer tire.', signature: sign });
    expect(fixed.status).toBe(201);
    expect(bodyOf<DefectResponse>(fixed)).toMatchObject({
      status: 'repaired',
      repair: { action: 'repaired', mechanic: { name: 'Rui Almeida' } },
    });
    const back = await vehicle(power.id);
    expect(back.status).toBe('in_service');
    expect(back.statusReason).toBeNull();
    const twice = await repair(safety.id, { action: 'repaired', note: 'Again.', signature: sign });
    expect(twice.status).toBe(409);

    const list = bodyOf<DefectResponse[]>(
      await request(t.url).get(`/api/defects?vehicleId=${power.id}`).set(bearer(tokens.supervisor)),
    );
    expect(list.map((d) => d.id)).toEqual([safety.id, minor.id]);
    const open = bodyOf<DefectResponse[]>(
      await request(t.url).get(`/api/defects?vehicleId=${power.id}&status=open`).set(bearer(tokens.mechanic)),
    );
    expect(open).toEqual([]);
    const detail = bodyOf<InspectionResponse>(
      await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(tokens.mechanic)),
    );
    expect(detail.signatures.map((s) => s.role)).toEqual(['driver', 'mechanic', 'mechanic']);
  });

  it("blocks the next pre-trip until a driver has reviewed and signed the last report's certified repairs", async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IA')));
    const inspection = await started([power.id]);
    const tread = steerTread(inspection.checklist.items);
    await put(inspection.id, [
      answer(tread, new Date(Date.parse(inspection.startedAt) + 60_000).toISOString(), { answer: 'defect' }),
    ]);
    const report = bodyOf<InspectionResponse>(await submit(inspection.id));
    const pendingPath = `/api/vehicles/${power.id}/pending-acknowledgement`;
    // Nothing certified yet: nothing to acknowledge.
    expect((await request(t.url).get(pendingPath).set(bearer(secondDriver))).status).toBe(204);
    await request(t.url)
      .post(`/api/defects/${report.defects[0]!.id}/repair`)
      .set(bearer(tokens.mechanic))
      .send({ action: 'repaired', note: 'Replaced the tire.', signature: { name: 'Rui Almeida' } })
      .expect(201);

    const blocked = await start([power.id], { token: secondDriver });
    expect(blocked.status).toBe(409);
    expect(errorBody(blocked).message).toMatch(/^Review and sign the last report of unit .* first/);
    // A post-trip is not gated.
    const pending = await request(t.url).get(pendingPath).set(bearer(secondDriver));
    expect(pending.status).toBe(200);
    expect(bodyOf<PendingAcknowledgement>(pending)).toMatchObject({
      inspectionId: inspection.id,
      vehicle: { id: power.id },
      driver: { name: 'Dana Okafor' },
      defects: [
        expect.objectContaining({
          status: 'repaired',
          repair: expect.objectContaining({ action: 'repaired' }) as unknown,
        }) as unknown,
      ],
    });
    // The report is another driver's: still hidden from reading, but open to acknowledgement.
    expect((await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(secondDriver))).status).toBe(404);
    const ack = await request(t.url)
      .post(`/api/inspections/${inspection.id}/acknowledge`)
      .set(bearer(secondDriver))
      .send({ signature: { name: 'Tomas Reyes' } });
    expect(ack.status).toBe(201);
    expect(bodyOf<SignatureResponse>(ack)).toMatchObject({ role: 'next_driver', name: 'Tomas Reyes' });
    expect(bodyOf<SignatureResponse>(ack).statement).toMatch(/reviewed the last inspection report/);
    expect((await request(t.url).get(pendingPath).set(bearer(secondDriver))).status).toBe(204);
    const again = await request(t.url)
      .post(`/api/inspections/${inspection.id}/acknowledge`)
      .set(bearer(secondDriver))
      .send({ signature: { name: 'Tomas Reyes' } });
    expect(again.status).toBe(404);
    expect((await start([power.id], { token: secondDriver })).status).toBe(201);
  });

  it('seeds a demo report of KV-103 whose certified repair waits for the next driver', async () => {
    const vehicles = bodyOf<VehicleResponse[]>(
      await request(t.url).get('/api/vehicles?q=KV-103').set(bearer(tokens.driver)),
    );
    const kv103 = vehicles.find((v) => v.unitNumber === 'KV-103')!;
    const pending = await request(t.url)
      .get(`/api/vehicles/${kv103.id}/pending-acknowledgement`)
      .set(bearer(tokens.driver));
    expect(pending.status).toBe(200);
    expect(bodyOf<PendingAcknowledgement>(pending)).toMatchObject({
      driver: { name: 'Aiyana Brooks' },
      defects: [{ safety: true, status: 'repaired', limit: { source: '49 CFR 393.75(b)' } }],
    });
    expect(kv103.status).toBe('in_service');
  });

  it('lists newest first with filters, and pages without duplicates or gaps', async () => {
    const power = await addVehicle(tractorRequest(unitNumber('IP')));
    const created: InspectionResponse[] = [];
    const tie = nextStart();
    for (let i = 0; i < 7; i += 1) {
      created.push(
        await started([power.id], {
          kind: i % 3 === 0 ? 'practice' : 'post_trip',
          startedAt: i < 3 ? tie : nextStart(),
        }),
      );
    }
    const second = await started([power.id], { token: secondDriver, kind: 'en_route' });
    const withDefect = created[4]!;
    await put(withDefect.id, [
      answer(
        nonSafetyCheck(withDefect.checklist.items),
        new Date(Date.parse(withDefect.startedAt) + 1000).toISOString(),
        {
          answer: 'defect',
        },
      ),
    ]);
    await submit(withDefect.id);

    const all = [...created, second];
    const expected = [...all]
      .sort((a, b) => b.startedAt.localeCompare(a.startedAt) || b.id.localeCompare(a.id))
      .map((i) => i.id);
    const seen: string[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const query: string = `/api/inspections?vehicleId=${power.id}&limit=3${cursor ? `&cursor=${cursor}` : ''}`;
      const page = bodyOf<InspectionPage>(await request(t.url).get(query).set(bearer(tokens.supervisor)));
      expect(page.items.length).toBeLessThanOrEqual(3);
      seen.push(...page.items.map((i) => i.id));
      cursor = page.nextCursor;
      pages += 1;
    } while (cursor && pages < 10);
    expect(seen).toEqual(expected);
    expect(pages).toBe(3);

    const get = async (query: string, token = tokens.supervisor) =>
      bodyOf<InspectionPage>(
        await request(t.url).get(`/api/inspections?vehicleId=${power.id}&${query}`).set(bearer(token)),
      )
        .items.map((i) => i.id)
        .sort();
    expect(await get('hasDefects=true')).toEqual([withDefect.id]);
    expect(await get('status=submitted')).toEqual([withDefect.id]);
    expect(await get('kind=practice')).toEqual(
      created
        .filter((i) => i.kind === 'practice')
        .map((i) => i.id)
        .sort(),
    );
    expect(await get(`driverId=${second.driver.id}`)).toEqual([second.id]);
    expect(await get(`from=${encodeURIComponent(created[6]!.startedAt)}`)).toEqual([created[6]!.id, second.id].sort());
    expect(await get(`to=${encodeURIComponent(created[3]!.startedAt)}`)).toEqual(
      created
        .slice(0, 3)
        .map((i) => i.id)
        .sort(),
    );
    // Drivers see their own; trainers the practice walk-arounds.
    expect(await get('', secondDriver)).toEqual([second.id]);
    expect(await get('', tokens.trainer)).toEqual(
      created
        .filter((i) => i.kind === 'practice')
        .map((i) => i.id)
        .sort(),
    );

    const bad = await request(t.url).get('/api/inspections?cursor=not-a-cursor&limit=500').set(bearer(tokens.admin));
    expect(bad.status).toBe(400);
    expect(
      errorBody(bad)
        .fields?.map((f) => f.field)
        .sort(),
    ).toEqual(['limit']);
    const badCursor = await request(t.url).get('/api/inspections?cursor=not-a-cursor').set(bearer(tokens.admin));
    expect(badCursor.status).toBe(400);
    expect(errorBody(badCursor).fields?.map((f) => f.field)).toEqual(['cursor']);
  });
});
