import type { ChecklistItem, FleetBoard, ResultUpsert } from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import {
  answerAndSubmit,
  bearer,
  bodyOf,
  createVehicle,
  newTractor,
  OTHER_ORG_ADMIN,
  signIn,
  startInspection,
  suiteApp,
  trailerRequest,
  unitNumber,
} from './helpers';

describe('fleet board', () => {
  const { t, tokens } = suiteApp();
  let otherAdmin: string;

  beforeAll(async () => {
    otherAdmin = await signIn(t.url, OTHER_ORG_ADMIN);
  });

  // A whole walk-around answered 6 s apart, `defects` answered as defects, then signed.
  async function walkAround(vehicleIds: string[], defects: (items: ChecklistItem[]) => ChecklistItem[]) {
    const started = await startInspection(t.url, tokens.driver, {
      vehicleIds,
      startedAt: new Date(Date.now() - 30 * 60_000).toISOString(),
    });
    const startMs = Date.parse(started.startedAt);
    const bad = new Set(defects(started.checklist.items).map((i) => i.key));
    const results: ResultUpsert[] = started.checklist.items.map((item, index) => ({
      itemKey: item.key,
      answer: bad.has(item.key) ? 'defect' : 'pass',
      answeredAt: new Date(startMs + (index + 1) * 6000).toISOString(),
      clientId: randomUUID(),
    }));
    return answerAndSubmit(t.url, tokens.driver, started.id, results);
  }

  it('shows each vehicle with its status, since when and why it is out of service, and its last report', async () => {
    const tractor = await newTractor(t.url, tokens.admin, 'FB');
    const trailer = await createVehicle(t.url, tokens.admin, trailerRequest(unitNumber('FT')));
    const report = await walkAround([tractor.id, trailer.id], (items) =>
      items.filter((i) => i.safety && i.unitIndex === 0 && i.expects.type === 'check').slice(0, 2),
    );
    const safety = report.defects.filter((d) => d.safety);
    expect(safety).toHaveLength(2);

    const response = await request(t.url).get('/api/fleet/board').set(bearer(tokens.supervisor));
    expect(response.status).toBe(200);
    const board = bodyOf<FleetBoard>(response);
    const row = board.vehicles.find((v) => v.id === tractor.id)!;
    expect(row).toMatchObject({ unitNumber: tractor.unitNumber, kind: 'tractor', status: 'out_of_service' });
    expect(row.outOfServiceSince).not.toBeNull();
    expect(row.openSafetyDefects.map((d) => [d.title, d.positionLabel, d.inspectionId])).toEqual(
      safety.map((d) => [d.title, d.positionLabel, report.id]),
    );
    expect(row.lastInspection).toEqual({
      id: report.id,
      kind: 'pre_trip',
      submittedAt: report.submittedAt,
      driver: report.driver,
    });
    const trailerRow = board.vehicles.find((v) => v.id === trailer.id)!;
    expect(trailerRow).toMatchObject({ status: 'in_service', outOfServiceSince: null, openSafetyDefects: [] });
    expect(trailerRow.lastInspection?.id).toBe(report.id);

    // Out of service first; the counts match the rows; the database agrees.
    const firstInService = board.vehicles.findIndex((v) => v.status === 'in_service');
    expect(board.vehicles.slice(firstInService).every((v) => v.status === 'in_service')).toBe(true);
    expect(board.outOfServiceCount + board.inServiceCount).toBe(board.vehicles.length);
    const [db] = await t.dataSource.query<{ n: number }[]>(
      "SELECT count(*)::int AS n FROM vehicles v JOIN users u ON u.organization_id = v.organization_id WHERE u.email = $1 AND v.status = 'out_of_service'",
      ['admin@yardcall.test'],
    );
    expect(board.outOfServiceCount).toBe(db!.n);
  });

  it("shows which units had a pre-trip today and which were used without one, today read in the organisation's zone", async () => {
    // A zone where it is about noon now, so "the last ten minutes" is today whatever the hour of the run.
    const offsetHours = 12 - new Date().getUTCHours();
    // Etc/GMT signs are inverted: Etc/GMT-5 is five hours ahead of UTC.
    const timeZone = offsetHours === 0 ? 'UTC' : `Etc/GMT${offsetHours > 0 ? '-' : '+'}${Math.abs(offsetHours)}`;
    const zone = (name: string) =>
      request(t.url).patch('/api/organizations/time-zone').set(bearer(tokens.admin)).send({ timeZone: name });
    expect((await zone(timeZone)).status).toBe(200);
    try {
      const checked = await newTractor(t.url, tokens.admin, 'FD');
      const used = await newTractor(t.url, tokens.admin, 'FU');
      const idle = await newTractor(t.url, tokens.admin, 'FI');
      const quickly = async (vehicleId: string, kind: 'pre_trip' | 'en_route') => {
        const started = await startInspection(t.url, tokens.driver, {
          vehicleIds: [vehicleId],
          kind,
          startedAt: new Date(Date.now() - 10 * 60_000).toISOString(),
        });
        const startMs = Date.parse(started.startedAt);
        return answerAndSubmit(
          t.url,
          tokens.driver,
          started.id,
          started.checklist.items.map((item, index) => ({
            itemKey: item.key,
            answer: 'pass',
            answeredAt: new Date(startMs + (index + 1) * 1000).toISOString(),
            clientId: randomUUID(),
          })),
        );
      };
      const preTrip = await quickly(checked.id, 'pre_trip');
      const enRoute = await quickly(used.id, 'en_route');

      const board = bodyOf<FleetBoard>(await request(t.url).get('/api/fleet/board').set(bearer(tokens.supervisor)));
      const today = new Intl.DateTimeFormat('en-CA', { timeZone }).format(new Date());
      expect({ day: board.day, timeZone: board.timeZone }).toEqual({ day: today, timeZone });
      const row = (id: string) => board.vehicles.find((v) => v.id === id)!;
      expect(row(checked.id).today).toEqual({
        preTrip: { id: preTrip.id, kind: 'pre_trip', submittedAt: preTrip.submittedAt, driver: preTrip.driver },
        usedWithoutPreTrip: null,
      });
      expect(row(used.id).today).toEqual({
        preTrip: null,
        usedWithoutPreTrip: {
          id: enRoute.id,
          kind: 'en_route',
          submittedAt: enRoute.submittedAt,
          driver: enRoute.driver,
        },
      });
      expect(row(idle.id).today).toEqual({ preTrip: null, usedWithoutPreTrip: null });
    } finally {
      // The demo organisation is shared by the other suites: back to UTC.
      expect((await zone('UTC')).status).toBe(200);
    }
  });

  it('is the same for a mechanic and an admin, and a vehicle never inspected has no last report', async () => {
    const fresh = await newTractor(t.url, tokens.admin, 'FN');
    for (const role of ['mechanic', 'admin'] as const) {
      const board = bodyOf<FleetBoard>(await request(t.url).get('/api/fleet/board').set(bearer(tokens[role])));
      expect(board.vehicles.find((v) => v.id === fresh.id)).toMatchObject({
        status: 'in_service',
        lastInspection: null,
        openSafetyDefects: [],
      });
    }
  });

  it("shows only the caller's organisation", async () => {
    const board = bodyOf<FleetBoard>(await request(t.url).get('/api/fleet/board').set(bearer(otherAdmin)));
    expect(board.vehicles.map((v) => v.unitNumber)).toEqual(['TB-7']);
    const own = bodyOf<FleetBoard>(await request(t.url).get('/api/fleet/board').set(bearer(tokens.admin)));
    expect(own.vehicles.map((v) => v.unitNumber)).not.toContain('TB-7');
  });

  it('refuses drivers and trainers', async () => {
    for (const role of ['driver', 'trainer'] as const) {
      expect((await request(t.url).get('/api/fleet/board').set(bearer(tokens[role]))).status).toBe(403);
    }
  });
});
