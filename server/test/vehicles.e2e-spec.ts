import { validateVehicle, type VehicleResponse } from '@yardcall/shared';
import request from 'supertest';
import {
  bearer,
  bodyOf,
  errorBody,
  expectFieldProblems,
  newTractor,
  OTHER_ORG_ADMIN,
  signIn,
  suiteApp,
  tractorRequest,
  unitNumber,
} from './helpers';

// A unit number free in this run, so the suite also passes against a database kept from an earlier run.

describe('vehicles', () => {
  const { t, tokens } = suiteApp();

  it('lists the seeded fleet to a driver, searches unit numbers by prefix and filters by kind', async () => {
    const all = await request(t.url).get('/api/vehicles').set(bearer(tokens.driver));
    expect(all.status).toBe(200);
    const units = (all.body as VehicleResponse[]).map((v) => v.unitNumber);
    expect(units).toEqual(expect.arrayContaining(['KV-101', 'KV-102', 'KV-103', 'KV-T21', 'KV-T22', 'KV-S31']));

    const search = await request(t.url).get('/api/vehicles?q=kv-t2').set(bearer(tokens.driver));
    expect((search.body as VehicleResponse[]).map((v) => v.unitNumber).filter((u) => u.startsWith('KV-'))).toEqual([
      'KV-T21',
      'KV-T22',
      'KV-T23',
    ]);

    const wildcard = await request(t.url).get('/api/vehicles?q=%25').set(bearer(tokens.driver));
    expect(wildcard.body).toEqual([]);

    const trucks = await request(t.url).get('/api/vehicles?kind=straight_truck').set(bearer(tokens.driver));
    expect((trucks.body as VehicleResponse[]).every((v) => v.kind === 'straight_truck')).toBe(true);
    expect((trucks.body as VehicleResponse[]).map((v) => v.unitNumber)).toContain('KV-S31');

    const badKind = await request(t.url).get('/api/vehicles?kind=boat').set(bearer(tokens.driver));
    expect(badKind.status).toBe(400);
    expect(errorBody(badKind).fields).toEqual([
      { field: 'kind', message: 'Choose a kind: tractor, trailer, straight_truck, bus.' },
    ]);
  });

  it('creates a vehicle, reads it back and refuses a second one with the same unit number in any case', async () => {
    const ours = unitNumber('KV');
    const created = await request(t.url)
      .post('/api/vehicles')
      .set(bearer(tokens.supervisor))
      .send(tractorRequest(ours));
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ unitNumber: ours, kind: 'tractor', status: 'in_service', statusReason: null });
    const read = await request(t.url)
      .get(`/api/vehicles/${bodyOf<VehicleResponse>(created).id}`)
      .set(bearer(tokens.mechanic));
    expect(read.body).toEqual(created.body);

    const duplicate = await request(t.url)
      .post('/api/vehicles')
      .set(bearer(tokens.admin))
      .send(tractorRequest(ours.toLowerCase()));
    expect(duplicate.status).toBe(409);
    expect(errorBody(duplicate).message).toBe(
      `Your organisation already has a unit ${ours.toLowerCase()}: choose another unit number.`,
    );
  });

  it('lets another organisation use the same unit number', async () => {
    const otherAdmin = await signIn(t.url, OTHER_ORG_ADMIN);
    const response = await request(t.url)
      .post('/api/vehicles')
      .set(bearer(otherAdmin))
      .send(tractorRequest(unitNumber('KV-101')));
    expect(response.status).toBe(201);
    // The other organisation's fleet stays as seeded: access.e2e-spec.ts lists it exactly, in any file order.
    await t.dataSource.query('DELETE FROM vehicles WHERE id = $1', [bodyOf<VehicleResponse>(response).id]);
  });

  it('answers 400 with each wrong axle field named by the shared vehicle rules', async () => {
    const body = tractorRequest(unitNumber('KV'));
    const [steer, drive] = body.config.axles;
    body.config.axles = [
      { ...steer!, tires: 'dual' },
      {
        ...drive!,
        brake: 'air_drum',
        chamber: undefined,
        tire: { size: '11R22.5', coldInflationPsi: 130, sidewallMaxPsi: 120 },
      },
      {
        position: 'trailer',
        tires: 'dual',
        brake: 'air_drum',
        chamber: { size: 36, stroke: 'long' },
        tire: { size: '11R22.5', coldInflationPsi: 100, sidewallMaxPsi: 120 },
      },
    ];
    body.vin = 'OOPS';
    const response = await request(t.url).post('/api/vehicles').set(bearer(tokens.admin)).send(body);
    expect(response.status).toBe(400);
    const fields = errorBody(response).fields ?? [];
    // The server answers exactly what the shared rules say (their wording is theirs to change)...
    expect(fields).toEqual(validateVehicle(body));
    // ...and names each wrong field by its path.
    expect(fields.map((f) => f.field)).toEqual([
      'vin',
      'config.axles.0.tires',
      'config.axles.1.chamber',
      'config.axles.1.tire.coldInflationPsi',
      'config.axles.2.position',
      'config.axles.2.chamber.stroke',
    ]);
    expect(fields.every((f) => f.message.length > 10)).toBe(true);
    expect(errorBody(response).message).toBe(`Check these 6 fields: ${fields.map((f) => f.field).join(', ')}.`);
  });

  it('answers 400, never 500, for wrong types and unknown fields deep in the configuration', async () => {
    const body = tractorRequest(unitNumber('KV')) as unknown as {
      config: { axles: Record<string, unknown>[]; paint?: string };
    };
    body.config.axles[0] = {
      ...body.config.axles[0],
      brake: 7,
      color: 'red',
      tire: { size: '11R22.5', coldInflationPsi: 'high', sidewallMaxPsi: 120 },
    };
    body.config.paint = 'blue';
    const response = await request(t.url).post('/api/vehicles').set(bearer(tokens.admin)).send(body);
    expectFieldProblems(response, [
      { field: 'config.paint', message: 'This field is not allowed here: remove it.' },
      { field: 'config.axles.0.color', message: 'This field is not allowed here: remove it.' },
      { field: 'config.axles.0.brake', message: 'Enter this as text.' },
      { field: 'config.axles.0.tire.coldInflationPsi', message: 'Enter this as a number.' },
    ]);

    for (const config of [null, 'three axles', [], { axles: 'many' }]) {
      const wrong = await request(t.url)
        .post('/api/vehicles')
        .set(bearer(tokens.admin))
        .send({ ...tractorRequest(unitNumber('KV')), config });
      expect({ config, status: wrong.status }).toEqual({ config, status: 400 });
      expect(errorBody(wrong).fields?.[0]?.field).toMatch(/^config/);
    }
  });

  it('takes a vehicle out of service with a reason, and back, with the time it changed', async () => {
    const created = await newTractor(t.url, tokens.admin, 'KV');
    const out = await request(t.url)
      .patch(`/api/vehicles/${created.id}`)
      .set(bearer(tokens.supervisor))
      .send({ status: 'out_of_service', statusReason: 'Air leak at the left drive chamber' });
    expect(out.status).toBe(200);
    expect(out.body).toMatchObject({ status: 'out_of_service', statusReason: 'Air leak at the left drive chamber' });
    expect(new Date(bodyOf<VehicleResponse>(out).statusSince).getTime()).toBeGreaterThan(
      new Date(created.statusSince).getTime(),
    );

    const back = await request(t.url)
      .patch(`/api/vehicles/${created.id}`)
      .set(bearer(tokens.supervisor))
      .send({ status: 'in_service' });
    expect(back.body).toMatchObject({ status: 'in_service', statusReason: null });
  });

  it('re-checks the whole vehicle on PATCH: a tractor cannot become a trailer with its power-unit axles', async () => {
    const created = await newTractor(t.url, tokens.admin, 'KV');
    const response = await request(t.url)
      .patch(`/api/vehicles/${created.id}`)
      .set(bearer(tokens.admin))
      .send({ kind: 'trailer' });
    expectFieldProblems(response, [
      { field: 'config.axles.0.position', message: expect.any(String) as string },
      { field: 'config.steering', message: expect.any(String) as string },
    ]);
    const unchanged = await request(t.url).get(`/api/vehicles/${created.id}`).set(bearer(tokens.admin));
    expect(bodyOf<VehicleResponse>(unchanged).kind).toBe('tractor');
  });

  it('answers 404 for a well-formed id that does not exist', async () => {
    const response = await request(t.url)
      .get('/api/vehicles/6f1c2a4e-3b5d-4c7e-9f8a-1b2c3d4e5f60')
      .set(bearer(tokens.driver));
    expect(response.status).toBe(404);
  });
});
