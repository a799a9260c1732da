import {
  READING_RULES,
  type ChecklistItem,
  type InspectionResponse,
  type OrganizationSummary,
  type PutResultsResponse,
  type ResultUpsert,
  type VehicleResponse,
} from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { bearer, bodyOf, errorBody, newTractor, OTHER_ORG_ADMIN, signIn, startInspection, suiteApp } from './helpers';

const measuring = (quantity: string) => (item: ChecklistItem) =>
  item.expects.type === 'measure' && item.expects.quantity === quantity;
const tirePressure = (items: ChecklistItem[]) => items.find(measuring('tire_pressure'))!;
const treadDepth = (items: ChecklistItem[]) => items.find(measuring('tread_depth'))!;
const lamp = (items: ChecklistItem[]) => items.find((i) => !i.safety && i.expects.type === 'check')!;

describe('required readings, checks without a reading and fixes on the spot', () => {
  // The demo organisation back to its default for the suites that follow.
  const { t, tokens } = suiteApp(() => setReadings([]));

  function setReadings(requiredReadings: unknown, token = tokens.admin) {
    return request(t.url).patch('/api/organizations/readings').set(bearer(token)).send({ requiredReadings });
  }

  async function current(token: string): Promise<OrganizationSummary> {
    return bodyOf<OrganizationSummary>(await request(t.url).get('/api/organizations/current').set(bearer(token)));
  }

  // A walk-around begun a few minutes ago, so its answers fall between its start and now.
  async function begin(): Promise<{
    inspection: InspectionResponse;
    vehicle: VehicleResponse;
    at: (s: number) => string;
  }> {
    const vehicle = await newTractor(t.url, tokens.admin, 'RD');
    const startedMs = Date.now() - 10 * 60_000;
    const inspection = await startInspection(t.url, tokens.driver, {
      vehicleIds: [vehicle.id],
      startedAt: new Date(startedMs).toISOString(),
    });
    return { inspection, vehicle, at: (seconds) => new Date(startedMs + seconds * 1000).toISOString() };
  }

  function answer(item: ChecklistItem, answeredAt: string, extra: Partial<ResultUpsert> = {}): ResultUpsert {
    return { itemKey: item.key, answer: 'pass', answeredAt, clientId: randomUUID(), ...extra };
  }

  function put(id: string, results: ResultUpsert[]) {
    return request(t.url).put(`/api/inspections/${id}/results`).set(bearer(tokens.driver)).send({ results });
  }

  function submit(id: string) {
    return request(t.url)
      .post(`/api/inspections/${id}/submit`)
      .set(bearer(tokens.driver))
      .send({ signature: { name: 'Dana Okafor', drawing: 'M10 10 L40 20' } });
  }

  describe('the organisation setting', () => {
    it('requires no reading by default and shows the setting to every signed-in role', async () => {
      expect((await setReadings([])).status).toBe(200);
      for (const role of ['driver', 'mechanic', 'admin'] as const) {
        expect((await current(tokens[role])).requiredReadings).toEqual([]);
      }
    });

    it('stores each chosen reading once, in the order the app lists them, for the driver to read', async () => {
      const response = await setReadings(['tire_pressure', 'steer_tread_depth', 'tire_pressure']);
      expect(response.status).toBe(200);
      expect(bodyOf<OrganizationSummary>(response).requiredReadings).toEqual(['steer_tread_depth', 'tire_pressure']);
      expect((await current(tokens.driver)).requiredReadings).toEqual(['steer_tread_depth', 'tire_pressure']);
      // Another organisation keeps its own.
      expect((await current(await signIn(t.url, OTHER_ORG_ADMIN))).requiredReadings).toEqual([]);
    });

    it('refuses a reading it does not know, naming it and the ones it knows, and changes nothing', async () => {
      expect((await setReadings(['tread_depth'])).status).toBe(200);
      const response = await setReadings(['tire_pressure', 'tire_presure']);
      expect(response.status).toBe(400);
      const body = errorBody(response);
      expect(body.fields).toEqual([
        { field: 'requiredReadings.1', message: expect.stringContaining('"tire_presure" is not a reading') as string },
      ]);
      for (const rule of READING_RULES) expect(body.message).toContain(rule);
      expect((await current(tokens.admin)).requiredReadings).toEqual(['tread_depth']);
    });

    it('refuses a body that is not a list, or a list of other things, with a 400 that says what to send', async () => {
      for (const sent of [undefined, 'tire_pressure', [3], {}]) {
        const response = await setReadings(sent);
        expect({ sent, status: response.status }).toEqual({ sent, status: 400 });
        expect(errorBody(response).fields?.[0]?.field).toBe('requiredReadings');
      }
      const many = await setReadings(Array.from({ length: 40 }, () => 'tire_pressure'));
      expect(many.status).toBe(400);
      expect(errorBody(many).message).toMatch(/each required reading once/i);
    });

    it('lets only an admin change it', async () => {
      for (const role of ['driver', 'mechanic', 'supervisor', 'trainer'] as const) {
        expect((await setReadings([], tokens[role])).status).toBe(403);
      }
    });
  });

  describe('a measured check passed without a value', () => {
    it("is recorded as checked without a reading, or no gauge where the walk-around requires the reading, by the inspection's own rules", async () => {
      expect((await setReadings(['tire_pressure'])).status).toBe(200);
      const { inspection, at } = await begin();
      expect(inspection.requiredReadings).toEqual(['tire_pressure']);
      const pressure = tirePressure(inspection.checklist.items);
      const tread = treadDepth(inspection.checklist.items);
      const check = lamp(inspection.checklist.items);

      // A later change of the setting rewrites no history: this walk-around keeps tire pressure required.
      expect((await setReadings([])).status).toBe(200);
      const response = await put(inspection.id, [
        // The client said "visual"; the walk-around requires the reading, so the server records "no gauge".
        answer(pressure, at(10), { noReading: 'visual' }),
        answer(tread, at(20)),
        answer(check, at(30)),
      ]);
      expect(response.status).toBe(200);
      const stored = new Map(bodyOf<PutResultsResponse>(response).results.map((r) => [r.itemKey, r]));
      expect(stored.get(pressure.key)).toMatchObject({ answer: 'pass', measurement: null, noReading: 'no_gauge' });
      expect(stored.get(tread.key)).toMatchObject({ answer: 'pass', measurement: null, noReading: 'visual' });
      expect(stored.get(check.key)).toMatchObject({ noReading: null, fixed: null });

      const read = bodyOf<InspectionResponse>(
        await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(tokens.supervisor)),
      );
      expect(read.requiredReadings).toEqual(['tire_pressure']);
      expect(read.results.find((r) => r.itemKey === pressure.key)?.noReading).toBe('no_gauge');
      const rows = await t.dataSource.query<{ no_reading: string | null }[]>(
        'SELECT no_reading FROM item_results WHERE inspection_id = $1 AND item_key = $2',
        [inspection.id, tread.key],
      );
      expect(rows).toEqual([{ no_reading: 'visual' }]);
    });

    it('refuses noReading on a defect, beside a measurement, or on a check that takes no reading', async () => {
      const { inspection, at } = await begin();
      const pressure = tirePressure(inspection.checklist.items);
      const check = lamp(inspection.checklist.items);
      const cases: [ResultUpsert, RegExp][] = [
        [answer(pressure, at(10), { answer: 'defect', noReading: 'visual' }), /only with a pass/],
        [
          answer(pressure, at(10), {
            noReading: 'no_gauge',
            measurement: { quantity: 'tire_pressure', value: 100, unit: 'psi' },
          }),
          /the measurement or noReading, not both/,
        ],
        [answer(check, at(10), { noReading: 'visual' }), /takes no reading/],
      ];
      for (const [sent, message] of cases) {
        const response = await put(inspection.id, [sent]);
        expect(response.status).toBe(400);
        expect(errorBody(response).fields).toEqual([
          { field: 'results.0.noReading', message: expect.stringMatching(message) as string },
        ]);
      }
      const unknown = await put(inspection.id, [answer(pressure, at(10), { noReading: 'forgot' as 'visual' })]);
      expect(unknown.status).toBe(400);
      expect(errorBody(unknown).fields?.[0]).toMatchObject({ field: 'results.0.noReading' });
      // Nothing of a refused batch is stored.
      const [count] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM item_results WHERE inspection_id = $1',
        [inspection.id],
      );
      expect(count!.n).toBe(0);
    });
  });

  describe('a defect fixed on the spot', () => {
    it('stores the new reading in the canonical unit with the server’s verdict, never the client’s', async () => {
      const { inspection, at } = await begin();
      const pressure = tirePressure(inspection.checklist.items);
      const specPsi = pressure.limitContext!.specPsi!;
      const response = await put(inspection.id, [
        answer(pressure, at(10), {
          answer: 'defect',
          measurement: { quantity: 'tire_pressure', value: Math.round(specPsi / 2), unit: 'psi' },
          detail: 'low, about half',
          fixed: {
            action: '  added air at the yard line ',
            // The spec in kilopascals; the client's verdict is ignored.
            measurement: { quantity: 'tire_pressure', value: specPsi * 6.894757, unit: 'kPa' },
            verdict: 'out_of_limit',
            heard: 'fixed, added air, now at spec',
            at: at(70),
          },
        }),
      ]);
      expect(response.status).toBe(200);
      const [stored] = bodyOf<PutResultsResponse>(response).results;
      expect(stored).toMatchObject({ answer: 'defect', verdict: 'out_of_limit', noReading: null });
      expect(stored!.fixed).toEqual({
        action: 'added air at the yard line',
        measurement: { quantity: 'tire_pressure', value: expect.closeTo(specPsi, 3) as number, unit: 'psi' },
        verdict: 'ok',
        heard: 'fixed, added air, now at spec',
        at: at(70),
      });
    });

    it('refuses a fix whose new reading is still out of limit, saying so', async () => {
      const { inspection, at } = await begin();
      const pressure = tirePressure(inspection.checklist.items);
      const specPsi = pressure.limitContext!.specPsi!;
      const low = { quantity: 'tire_pressure' as const, value: Math.round(specPsi / 2), unit: 'psi' };
      const still = await put(inspection.id, [
        answer(pressure, at(10), {
          answer: 'defect',
          measurement: low,
          fixed: { action: 'added air', measurement: { ...low, value: low.value + 5 }, verdict: 'ok', at: at(60) },
        }),
      ]);
      expect(still.status).toBe(400);
      expect(errorBody(still).fields).toEqual([
        {
          field: 'results.0.fixed.measurement',
          message: expect.stringMatching(/still out of limit .*49 CFR 393\.75/) as string,
        },
      ]);
      // Nothing of the refused answer was stored.
      const [count] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM item_results WHERE inspection_id = $1',
        [inspection.id],
      );
      expect(count!.n).toBe(0);
    });

    it('refuses a fix of a value out of limit sent without a new reading, naming the reading it needs', async () => {
      const { inspection, at } = await begin();
      const pressure = tirePressure(inspection.checklist.items);
      const check = lamp(inspection.checklist.items);
      const specPsi = pressure.limitContext!.specPsi!;
      const low = { quantity: 'tire_pressure' as const, value: Math.round(specPsi / 2), unit: 'psi' };
      const refused = await put(inspection.id, [
        answer(pressure, at(10), { answer: 'defect', measurement: low, fixed: { action: 'added air', at: at(60) } }),
      ]);
      expect(refused.status).toBe(400);
      expect(errorBody(refused).fields).toEqual([
        {
          field: 'results.0.fixed.measurement',
          message: expect.stringMatching(/out of limit .*49 CFR 393\.75.*needs the new reading/) as string,
        },
      ]);
      const [count] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM item_results WHERE inspection_id = $1',
        [inspection.id],
      );
      expect(count!.n).toBe(0);
      // A defect the driver described is still fixed on their word.
      const described = await put(inspection.id, [
        answer(check, at(10), { answer: 'defect', detail: 'lens dirty', fixed: { action: 'wiped it', at: at(20) } }),
      ]);
      expect(described.status).toBe(200);
      expect(bodyOf<PutResultsResponse>(described).results[0]!.fixed).toEqual({ action: 'wiped it', at: at(20) });
    });

    it('refuses a fix on a pass, a blank or overlong action, and a new reading on a check that takes none', async () => {
      const { inspection, at } = await begin();
      const check = lamp(inspection.checklist.items);
      const cases: [ResultUpsert, string, RegExp][] = [
        [answer(check, at(10), { fixed: { action: 'wiped it', at: at(20) } }), 'results.0.fixed', /only with a defect/],
        [
          answer(check, at(10), { answer: 'defect', fixed: { action: '   ', at: at(20) } }),
          'results.0.fixed.action',
          /Say what was done/,
        ],
        [
          answer(check, at(10), { answer: 'defect', fixed: { action: 'x'.repeat(301), at: at(20) } }),
          'results.0.fixed.action',
          /under 300 characters/,
        ],
        [
          answer(check, at(10), {
            answer: 'defect',
            fixed: {
              action: 'replaced',
              measurement: { quantity: 'tread_depth', value: 8, unit: 'in/32' },
              at: at(20),
            },
          }),
          'results.0.fixed.measurement',
          /takes no measurement/,
        ],
        [
          answer(check, at(10), { answer: 'defect', fixed: { action: 'replaced', at: 'soon' } }),
          'results.0.fixed.at',
          /ISO 8601/,
        ],
      ];
      for (const [sent, field, message] of cases) {
        const response = await put(inspection.id, [sent]);
        expect({ field, status: response.status }).toEqual({ field, status: 400 });
        expect(errorBody(response).fields).toEqual([{ field, message: expect.stringMatching(message) as string }]);
      }
    });

    it('stays on the report but opens no shop defect, sends no safety e-mail and keeps the unit in service', async () => {
      const { inspection, vehicle, at } = await begin();
      const pressure = tirePressure(inspection.checklist.items);
      const check = lamp(inspection.checklist.items);
      const specPsi = pressure.limitContext!.specPsi!;
      expect(pressure.safety).toBe(true);
      const stored = await put(inspection.id, [
        answer(pressure, at(10), {
          answer: 'defect',
          measurement: { quantity: 'tire_pressure', value: Math.round(specPsi / 2), unit: 'psi' },
          fixed: {
            action: 'added air',
            measurement: { quantity: 'tire_pressure', value: specPsi, unit: 'psi' },
            at: at(70),
          },
        }),
        // A defect that is not fixed still opens a shop defect.
        answer(check, at(90), { answer: 'defect', detail: 'cracked lens' }),
      ]);
      expect(stored.status).toBe(200);
      const response = await submit(inspection.id);
      expect(response.status).toBe(200);
      const report = bodyOf<InspectionResponse>(response);
      expect(report.defects.map((d) => d.itemKey)).toEqual([check.key]);
      expect(report.defectCount).toBe(1);
      expect(report.summary.fixedOnTheSpot.map((f) => f.itemKey)).toEqual([pressure.key]);
      expect(report.summary.mayBeDriven).toBe(true);
      expect(report.results.find((r) => r.itemKey === pressure.key)?.fixed?.action).toBe('added air');

      const after = bodyOf<VehicleResponse>(
        await request(t.url).get(`/api/vehicles/${vehicle.id}`).set(bearer(tokens.admin)),
      );
      expect(after.status).toBe('in_service');
      const [jobs] = await t.dataSource.query<{ n: number }[]>(
        `SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'safety-defect-reported' AND data->>'inspectionId' = $1`,
        [inspection.id],
      );
      expect(jobs!.n).toBe(0);
      const [shop] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM defects WHERE inspection_id = $1 AND item_key = $2',
        [inspection.id, pressure.key],
      );
      expect(shop!.n).toBe(0);
    });
  });
});
