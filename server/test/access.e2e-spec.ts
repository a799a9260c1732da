import { ROLES, type Role, type UserSummary, type VehicleResponse } from '@yardcall/shared';
import request from 'supertest';
import { bearer, bodyOf, errorBody, login, OTHER_ORG_ADMIN, ROLE_EMAILS, suiteApp } from './helpers';

const NOWHERE_ID = '00000000-0000-4000-8000-000000000000';

// Who may call what: the design, one row per route. A route in the OpenAPI document without a row fails.
type Access = 'public' | 'signed-in' | Role[];
interface RouteRow {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  access: Access;
}

const ROUTES: RouteRow[] = [
  { method: 'post', path: '/api/auth/login', access: 'public' },
  { method: 'get', path: '/api/auth/me', access: 'signed-in' },
  { method: 'patch', path: '/api/auth/me/settings', access: 'signed-in' },
  { method: 'get', path: '/api/organizations/current', access: 'signed-in' },
  { method: 'get', path: '/api/users', access: ['admin', 'supervisor', 'trainer'] },
  { method: 'post', path: '/api/users', access: ['admin'] },
  { method: 'patch', path: '/api/users/{id}', access: ['admin'] },
  { method: 'get', path: '/api/invitations/{token}', access: 'public' },
  { method: 'post', path: '/api/invitations/{token}/accept', access: 'public' },
  { method: 'get', path: '/api/mail/outbox', access: ['admin'] },
  { method: 'get', path: '/api/vehicles', access: 'signed-in' },
  { method: 'post', path: '/api/vehicles', access: ['admin', 'supervisor'] },
  { method: 'get', path: '/api/vehicles/{id}', access: 'signed-in' },
  { method: 'patch', path: '/api/vehicles/{id}', access: ['admin', 'supervisor'] },
  { method: 'get', path: '/api/health', access: 'public' },
  { method: 'post', path: '/api/inspections', access: ['driver'] },
  { method: 'get', path: '/api/inspections', access: 'signed-in' },
  { method: 'get', path: '/api/inspections/{id}', access: 'signed-in' },
  { method: 'put', path: '/api/inspections/{id}/results', access: ['driver'] },
  { method: 'post', path: '/api/inspections/{id}/submit', access: ['driver'] },
  { method: 'post', path: '/api/inspections/{id}/acknowledge', access: ['driver'] },
  { method: 'get', path: '/api/vehicles/{id}/pending-acknowledgement', access: ['driver'] },
  { method: 'get', path: '/api/defects', access: ['mechanic', 'supervisor', 'admin'] },
  { method: 'post', path: '/api/defects/{id}/repair', access: ['mechanic'] },
  { method: 'post', path: '/api/inspections/{id}/notes', access: ['driver'] },
  { method: 'get', path: '/api/notes/{id}/audio', access: 'signed-in' },
  { method: 'post', path: '/api/inspections/{id}/photos', access: ['driver'] },
  { method: 'get', path: '/api/photos/{id}', access: 'signed-in' },
  { method: 'get', path: '/api/inspections/{id}/report.pdf', access: 'signed-in' },
  { method: 'get', path: '/api/fleet/board', access: ['supervisor', 'admin', 'mechanic'] },
  { method: 'get', path: '/api/inspections/export.csv', access: ['supervisor', 'admin'] },
  { method: 'patch', path: '/api/organizations/readings', access: ['admin'] },
  { method: 'get', path: '/api/organizations/time-zone', access: 'signed-in' },
  { method: 'patch', path: '/api/organizations/time-zone', access: ['admin'] },
  { method: 'get', path: '/api/organizations/retention', access: ['admin'] },
  { method: 'patch', path: '/api/organizations/retention', access: ['admin'] },
  { method: 'post', path: '/api/organizations/retention/purge', access: ['admin'] },
  { method: 'post', path: '/api/training/attempts', access: ['driver'] },
  { method: 'get', path: '/api/training/attempts', access: ['trainer', 'driver'] },
  { method: 'get', path: '/api/training/attempts/{id}', access: ['trainer', 'driver'] },
  { method: 'put', path: '/api/training/attempts/{id}/segments', access: ['driver'] },
  { method: 'post', path: '/api/training/attempts/{id}/audio', access: ['driver'] },
  { method: 'get', path: '/api/training/attempts/{id}/audio', access: ['trainer', 'driver'] },
  { method: 'post', path: '/api/training/attempts/{id}/finish', access: ['driver'] },
  { method: 'put', path: '/api/training/attempts/{id}/review', access: ['trainer'] },
  { method: 'get', path: '/api/training/progress', access: ['trainer', 'driver'] },
];

interface OpenApiDocument {
  paths: Record<string, Record<string, { 'x-roles'?: Role[] }>>;
}

describe('access control', () => {
  const { t, tokens } = suiteApp();
  let params: Record<string, string>;

  beforeAll(async () => {
    const vehicles = (await request(t.url).get('/api/vehicles').set(bearer(tokens.driver))).body as VehicleResponse[];
    const me = (await request(t.url).get('/api/auth/me').set(bearer(tokens.driver))).body as UserSummary;
    params = { '/api/users/{id}': me.id, '/api/vehicles/{id}': vehicles[0]!.id, token: 'not-a-real-invitation-token' };
    // Inspections and defects: an id that exists nowhere, so allowed callers get 400 or 404, never 403.
    Object.assign(params, {
      '/api/inspections/{id}': NOWHERE_ID,
      '/api/inspections/{id}/results': NOWHERE_ID,
      '/api/inspections/{id}/submit': NOWHERE_ID,
      '/api/inspections/{id}/acknowledge': NOWHERE_ID,
      '/api/vehicles/{id}/pending-acknowledgement': vehicles[0]!.id,
      '/api/defects/{id}/repair': NOWHERE_ID,
    });
    // Notes, photos and reports: likewise an id that exists nowhere.
    Object.assign(params, {
      '/api/inspections/{id}/notes': NOWHERE_ID,
      '/api/notes/{id}/audio': NOWHERE_ID,
      '/api/inspections/{id}/photos': NOWHERE_ID,
      '/api/photos/{id}': NOWHERE_ID,
      '/api/inspections/{id}/report.pdf': NOWHERE_ID,
    });
    // Training attempts: likewise an id that exists nowhere.
    for (const path of [
      '/api/training/attempts/{id}',
      '/api/training/attempts/{id}/segments',
      '/api/training/attempts/{id}/audio',
      '/api/training/attempts/{id}/finish',
      '/api/training/attempts/{id}/review',
    ]) {
      params[path] = NOWHERE_ID;
    }
  });

  function concretePath(row: RouteRow): string {
    return row.path.replace('{id}', params[row.path] ?? '').replace('{token}', params.token ?? '');
  }

  function send(row: RouteRow, token?: string) {
    let call = request(t.url)[row.method](concretePath(row));
    if (token) call = call.set(bearer(token));
    // An empty body: allowed callers then get past the guards and fail validation (400) or succeed.
    return row.method === 'get' ? call : call.send({});
  }

  it('has a row for every route in the OpenAPI document and no row for a missing route', async () => {
    const doc = (await request(t.url).get('/api/docs-json')).body as OpenApiDocument;
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((m) => `${m} ${path}`));
    expect(documented.sort()).toEqual(ROUTES.map((r) => `${r.method} ${r.path}`).sort());
  });

  it('documents the roles of every restricted route in OpenAPI as x-roles', async () => {
    const doc = (await request(t.url).get('/api/docs-json')).body as OpenApiDocument;
    for (const row of ROUTES) {
      const roles = doc.paths[row.path]?.[row.method]?.['x-roles'];
      expect({ route: `${row.method} ${row.path}`, roles }).toEqual({
        route: `${row.method} ${row.path}`,
        roles: Array.isArray(row.access) ? row.access : undefined,
      });
    }
  });

  describe.each(ROUTES)('$method $path', (row) => {
    if (row.access === 'public') {
      it('answers without a token', async () => {
        const response = await send(row);
        expect([401, 403]).not.toContain(response.status);
        expect(response.status).toBeLessThan(500);
      });
      return;
    }

    it('refuses a caller without a token with 401', async () => {
      const response = await send(row);
      expect(response.status).toBe(401);
      expect(errorBody(response).message).toMatch(/sign in/i);
    });

    const allowed = row.access === 'signed-in' ? [...ROLES] : row.access;
    it.each([...ROLES])('as %s', async (role) => {
      const response = await send(row, tokens[role]);
      if (allowed.includes(role)) {
        expect({ role, status: response.status }).not.toEqual({ role, status: 403 });
        expect(response.status).not.toBe(401);
        expect(response.status).toBeLessThan(500);
      } else {
        expect(response.status).toBe(403);
        expect(errorBody(response).message).toContain(`may do this; you are signed in as ${role}`);
        for (const name of allowed) expect(errorBody(response).message).toContain(name);
      }
    });
  });
});

describe('organisation scoping', () => {
  const { t, tokens: own } = suiteApp();
  let otherAdmin: string;

  beforeAll(async () => {
    otherAdmin = (await login(t.url, OTHER_ORG_ADMIN)).accessToken;
  });

  it("answers 404 for another organisation's vehicle, as if it did not exist", async () => {
    const vehicles = (await request(t.url).get('/api/vehicles').set(bearer(own.admin))).body as VehicleResponse[];
    const id = vehicles[0]!.id;
    const read = await request(t.url).get(`/api/vehicles/${id}`).set(bearer(otherAdmin));
    expect(read.status).toBe(404);
    expect(read.body).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'No vehicle with this id in your organisation.',
    });
    const patch = await request(t.url).patch(`/api/vehicles/${id}`).set(bearer(otherAdmin)).send({ plate: 'HIJACK 1' });
    expect(patch.status).toBe(404);
    const after = await request(t.url).get(`/api/vehicles/${id}`).set(bearer(own.admin));
    expect(bodyOf<VehicleResponse>(after).plate).toBe(vehicles[0]!.plate);
  });

  it("answers 404 for another organisation's user and leaves it unchanged", async () => {
    const users = (await request(t.url).get('/api/users').set(bearer(own.admin))).body as UserSummary[];
    const driver = users.find((u) => u.email === ROLE_EMAILS.driver)!;
    const patch = await request(t.url).patch(`/api/users/${driver.id}`).set(bearer(otherAdmin)).send({ role: 'admin' });
    expect(patch.status).toBe(404);
    const again = (await request(t.url).get('/api/users').set(bearer(own.admin))).body as UserSummary[];
    expect(again.find((u) => u.id === driver.id)?.role).toBe('driver');
  });

  it("lists only the caller's own organisation", async () => {
    const ownVehicles = (await request(t.url).get('/api/vehicles').set(bearer(own.admin))).body as VehicleResponse[];
    const otherVehicles = (await request(t.url).get('/api/vehicles').set(bearer(otherAdmin))).body as VehicleResponse[];
    expect(otherVehicles.map((v) => v.unitNumber)).toEqual(['TB-7']);
    expect(ownVehicles.map((v) => v.unitNumber)).not.toContain('TB-7');
    const otherUsers = (await request(t.url).get('/api/users').set(bearer(otherAdmin))).body as UserSummary[];
    expect(otherUsers.map((u) => u.email)).toEqual([OTHER_ORG_ADMIN]);
  });

  it.each([
    ['get', '/api/vehicles/not-a-uuid'],
    ['patch', '/api/vehicles/12345'],
    ['patch', '/api/users/abc'],
  ] as const)('answers 400 naming the id for %s %s', async (method, path) => {
    const response = await request(t.url)[method](path).set(bearer(own.admin)).send({});
    expect(response.status).toBe(400);
    expect(errorBody(response).fields).toEqual([
      { field: 'id', message: expect.stringContaining('must be a UUID') as string },
    ]);
  });
});
