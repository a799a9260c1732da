import type { ApiErrorBody, Role } from '@yardcall/shared';
import request from 'supertest';
import { bearer, suiteApp } from './helpers';

// Every route of the app's own OpenAPI document, fed malformed, oversized, wrong-type, deeply nested,
// NUL, surrogate and null input: never a 5xx, always a 4xx whose message says what is wrong.

const NOWHERE_ID = '00000000-0000-4000-8000-000000000000';
const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;
type Method = (typeof METHODS)[number];

interface Schema {
  $ref?: string;
  type?: string;
  nullable?: boolean;
  enum?: unknown[];
  format?: string;
  items?: Schema;
  properties?: Record<string, Schema>;
  allOf?: Schema[];
}

interface Operation {
  'x-roles'?: Role[];
  security?: unknown[];
  parameters?: { name: string; in: 'path' | 'query'; schema?: Schema }[];
  requestBody?: { content: Record<string, { schema: Schema }> };
}

interface OpenApiDocument {
  paths: Record<string, Partial<Record<Method, Operation>>>;
  components: { schemas: Record<string, Schema> };
}

interface Route {
  method: Method;
  path: string;
  operation: Operation;
}

interface Probe {
  route: Route;
  label: string;
  // The field the answer must name, when the probe targets one.
  field?: string;
  // A word the message must hold, when the probe is about the body as a whole.
  says?: RegExp;
  send: () => request.Test;
}

function resolve(doc: OpenApiDocument, schema: Schema | undefined): Schema {
  if (!schema) return {};
  if (schema.$ref) return resolve(doc, doc.components.schemas[schema.$ref.replace('#/components/schemas/', '')]);
  if (schema.allOf?.length === 1) return { ...resolve(doc, schema.allOf[0]), nullable: schema.nullable };
  return schema;
}

// A value of the wrong JSON type for the schema.
function wrongTypeFor(schema: Schema): unknown {
  if (schema.type === 'string' || schema.enum) return 12345;
  if (schema.type === 'array') return 'not a list';
  return ['not', 'this'];
}

function isTextField(schema: Schema): boolean {
  return schema.type === 'string' && !schema.enum;
}

function deeplyNested(levels: number): string {
  return `${'{"a":'.repeat(levels)}1${'}'.repeat(levels)}`;
}

function namesField(body: ApiErrorBody, field: string): boolean {
  const named = (body.fields ?? []).some((f) => f.field === field || f.field.startsWith(`${field}.`));
  return named || body.message.includes(field);
}

describe('every route of the OpenAPI document against hostile input', () => {
  const { t, tokens } = suiteApp();
  let doc: OpenApiDocument;
  let routes: Route[];

  beforeAll(async () => {
    doc = (await request(t.url).get('/api/docs-json')).body as OpenApiDocument;
    routes = Object.entries(doc.paths).flatMap(([path, operations]) =>
      METHODS.flatMap((method) => {
        const operation = operations[method];
        return operation ? [{ method, path, operation }] : [];
      }),
    );
  });

  // A caller the route lets through its guards: its first documented role, else an admin (any
  // signed-in user) or nobody for the public routes.
  function call(route: Route, path = route.path.replace(/\{[^}]+\}/g, NOWHERE_ID)): request.Test {
    const test = request(t.url)[route.method](path);
    const roles = route.operation['x-roles'];
    const isPublic = !route.operation.security?.length && !roles;
    if (isPublic) return test;
    return test.set(bearer(tokens[roles?.[0] ?? 'admin']));
  }

  function jsonBodySchema(route: Route): Schema | null {
    const content = route.operation.requestBody?.content['application/json'];
    return content ? resolve(doc, content.schema) : null;
  }

  function probesOf(route: Route): Probe[] {
    const probes: Probe[] = [];
    const name = `${route.method.toUpperCase()} ${route.path}`;
    const body = jsonBodySchema(route);
    if (body) {
      probes.push(
        {
          route,
          label: `${name}: malformed JSON`,
          says: /JSON/,
          send: () => call(route).set('Content-Type', 'application/json').send('{"a": [1, 2'),
        },
        {
          route,
          label: `${name}: JSON nested 4,000 levels deep`,
          says: /nested more than \d+ levels/,
          send: () => call(route).set('Content-Type', 'application/json').send(deeplyNested(4000)),
        },
        {
          route,
          label: `${name}: a list where an object belongs`,
          says: /./,
          send: () => call(route).send([{ a: 1 }]),
        },
      );
      for (const [field, raw] of Object.entries(body.properties ?? {})) {
        const schema = resolve(doc, raw);
        const withField = (value: unknown) => () => call(route).send({ [field]: value });
        probes.push({
          route,
          label: `${name}: ${field} of the wrong type`,
          field,
          send: withField(wrongTypeFor(schema)),
        });
        if (!schema.nullable) probes.push({ route, label: `${name}: ${field} null`, field, send: withField(null) });
        if (isTextField(schema)) {
          probes.push(
            { route, label: `${name}: ${field} with a NUL`, field, send: withField('ab\u0000cd') },
            { route, label: `${name}: ${field} with an unpaired surrogate`, field, send: withField('ab\ud800cd') },
            { route, label: `${name}: ${field} of 300,000 characters`, field, send: withField('x'.repeat(300_000)) },
          );
        }
      }
    }
    if (route.operation.requestBody?.content['multipart/form-data']) {
      probes.push(
        {
          route,
          label: `${name}: multipart without a boundary`,
          says: /upload|multipart/i,
          send: () => call(route).set('Content-Type', 'multipart/form-data').send('--x\r\n\r\nnothing'),
        },
        {
          route,
          label: `${name}: truncated multipart`,
          says: /upload|multipart/i,
          send: () =>
            call(route)
              .set('Content-Type', 'multipart/form-data; boundary=yardcall')
              .send('--yardcall\r\nContent-Disposition: form-data; name="file"; filename="a.webm"\r\n\r\nabc'),
        },
      );
    }
    for (const parameter of route.operation.parameters ?? []) {
      if (parameter.in === 'path') {
        const bad = route.path.replace(`{${parameter.name}}`, 'not%00an-id').replace(/\{[^}]+\}/g, NOWHERE_ID);
        probes.push({
          route,
          label: `${name}: path ${parameter.name} with a NUL`,
          field: parameter.name,
          send: () => call(route, bad),
        });
      } else {
        const schema = resolve(doc, parameter.schema);
        const path = route.path.replace(/\{[^}]+\}/g, NOWHERE_ID);
        const withQuery = (value: string) => () => call(route, `${path}?${parameter.name}=${value}`);
        probes.push({
          route,
          label: `${name}: query ${parameter.name} with a NUL`,
          field: parameter.name,
          send: withQuery('a%00b'),
        });
        if (schema.type !== 'string' || schema.enum || schema.format) {
          probes.push({
            route,
            label: `${name}: query ${parameter.name} of the wrong type`,
            field: parameter.name,
            send: withQuery('%7B%22not%22%3A%22this%22%7D'),
          });
        }
        if (parameter.name === 'cursor') {
          const impossible = Buffer.from(`["startedAt","desc","2026-02-31T05:40:00.000Z","${NOWHERE_ID}"]`);
          probes.push({
            route,
            label: `${name}: a cursor holding an impossible date`,
            field: 'cursor',
            send: withQuery(impossible.toString('base64url')),
          });
        }
      }
    }
    return probes;
  }

  it('walks a document of the whole API', () => {
    expect(routes.length).toBeGreaterThan(40);
    const withBodies = routes.filter((r) => jsonBodySchema(r));
    expect(withBodies.length).toBeGreaterThan(15);
  });

  it('answers every hostile request with a 4xx that names what is wrong, never a 5xx', async () => {
    const failures: string[] = [];
    let sent = 0;
    for (const route of routes) {
      for (const probe of probesOf(route)) {
        const response = await probe.send();
        sent += 1;
        const body = response.body as ApiErrorBody;
        const message = typeof body?.message === 'string' ? body.message : '';
        if (response.status < 400 || response.status >= 500) {
          failures.push(`${probe.label}: answered ${response.status} ${response.text.slice(0, 200)}`);
        } else if (!message) {
          failures.push(`${probe.label}: ${response.status} without a message`);
        } else if (probe.field && !namesField(body, probe.field)) {
          failures.push(`${probe.label}: ${response.status} "${message}" does not name ${probe.field}`);
        } else if (probe.says && !probe.says.test(message)) {
          failures.push(`${probe.label}: ${response.status} "${message}" does not say ${String(probe.says)}`);
        }
      }
    }
    expect(sent).toBeGreaterThan(300);
    expect(failures).toEqual([]);
  }, 180_000);
});
