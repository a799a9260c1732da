import type { ChecklistItem, InspectionResponse, VehicleResponse } from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { bearer, bodyOf, errorBody, newTractor, startInspection, suiteApp } from './helpers';

const minutesAgo = (minutes: number) => new Date(Date.now() - minutes * 60_000).toISOString();

const steerTread = (items: ChecklistItem[]) =>
  items.find(
    (i) => i.expects.type === 'measure' && i.expects.quantity === 'tread_depth' && i.limitContext?.axle === 'steer',
  )!;

// A report signed on the phone with no signal arrives later: the server keeps both times.
describe('a report signed with no signal', () => {
  const { t, tokens } = suiteApp();

  const submit = (id: string, body: Record<string, unknown>) =>
    request(t.url)
      .post(`/api/inspections/${id}/submit`)
      .set(bearer(tokens.driver))
      .send({ signature: { name: 'Dana Okafor' }, ...body });

  async function vehicle(id: string): Promise<VehicleResponse> {
    return bodyOf<VehicleResponse>(await request(t.url).get(`/api/vehicles/${id}`).set(bearer(tokens.admin)));
  }

  it('keeps the time it was signed on the signature, its arrival as submittedAt, and parks the unit on arrival', async () => {
    const power = await newTractor(t.url, tokens.admin, 'SO');
    const inspection = await startInspection(t.url, tokens.driver, {
      vehicleIds: [power.id],
      startedAt: minutesAgo(90),
    });
    const tread = steerTread(inspection.checklist.items);
    const put = await request(t.url)
      .put(`/api/inspections/${inspection.id}/results`)
      .set(bearer(tokens.driver))
      .send({
        results: [
          {
            clientId: randomUUID(),
            itemKey: tread.key,
            answer: 'pass',
            answeredAt: minutesAgo(80),
            measurement: { quantity: 'tread_depth', value: 3, unit: 'in/32' },
          },
        ],
      });
    expect(put.status).toBe(200);
    expect((await vehicle(power.id)).status).not.toBe('out_of_service');

    const signedAt = minutesAgo(75);
    const before = Date.now();
    const response = await submit(inspection.id, { signedAt });
    expect(response.status).toBe(200);
    const report = bodyOf<InspectionResponse>(response);

    expect(report.signatures.find((s) => s.role === 'driver')?.signedAt).toBe(signedAt);
    expect(Date.parse(report.submittedAt ?? '')).toBeGreaterThanOrEqual(before - 1000);
    expect((await vehicle(power.id)).status).toBe('out_of_service');
  });

  it('refuses a signing time before the walk-around began or ahead of the server clock, saying which', async () => {
    const power = await newTractor(t.url, tokens.admin, 'SO');
    const inspection = await startInspection(t.url, tokens.driver, {
      vehicleIds: [power.id],
      startedAt: minutesAgo(30),
    });

    const early = await submit(inspection.id, { signedAt: minutesAgo(45) });
    expect(early.status).toBe(400);
    expect(errorBody(early).fields?.map((f) => f.field)).toEqual(['signedAt']);

    const ahead = await submit(inspection.id, { signedAt: new Date(Date.now() + 24 * 3_600_000).toISOString() });
    expect(ahead.status).toBe(400);
    expect(errorBody(ahead).fields?.map((f) => f.field)).toEqual(['signedAt']);

    // Nothing was signed: the walk-around can still be signed properly.
    expect((await submit(inspection.id, { signedAt: minutesAgo(1) })).status).toBe(200);
  });
});
