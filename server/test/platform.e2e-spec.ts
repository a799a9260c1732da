import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type { TestApp } from './helpers';
import { errorBody } from './http';

// This file sets CLIENT_DIST before loading the app, so it imports the app dynamically.
describe('platform: client, security headers, errors', () => {
  let t: TestApp;
  const clientDist = mkdtempSync(join(tmpdir(), 'yardcall-client-'));
  const previousClientDist = process.env.CLIENT_DIST;

  beforeAll(async () => {
    writeFileSync(join(clientDist, 'index.html'), '<!doctype html><title>Yardcall</title><div id="root"></div>');
    writeFileSync(join(clientDist, 'app.js'), 'console.log("yardcall");');
    process.env.CLIENT_DIST = clientDist;
    const { startApp } = await import('./helpers.js');
    t = await startApp();
  });
  afterAll(async () => {
    await t.close();
    process.env.CLIENT_DIST = previousClientDist;
    rmSync(clientDist, { recursive: true, force: true });
  });

  it('serves the built client at / and its files, and falls back to index.html for app routes', async () => {
    const root = await request(t.url).get('/');
    expect(root.status).toBe(200);
    expect(root.text).toContain('<div id="root"></div>');
    expect((await request(t.url).get('/app.js')).text).toContain('yardcall');
    const deep = await request(t.url).get('/inspections/123/report');
    expect(deep.status).toBe(200);
    expect(deep.text).toContain('<div id="root"></div>');
  });

  it('answers unknown /api paths with the JSON error shape, not the client', async () => {
    const response = await request(t.url).get('/api/no-such-route');
    expect(response.status).toBe(404);
    expect(response.body).toEqual({ statusCode: 404, error: 'Not Found', message: 'Cannot GET /api/no-such-route.' });
  });

  it('sends a content security policy that allows the app itself and nothing else', async () => {
    const csp = (await request(t.url).get('/')).headers['content-security-policy'] as string;
    const directives: Record<string, string[]> = Object.fromEntries(
      csp.split(';').map((d): [string, string[]] => {
        const [name = '', ...values] = d.trim().split(/\s+/);
        return [name, values];
      }),
    );
    expect(directives['default-src']).toEqual(["'self'"]);
    // Scripts from the app only; WebAssembly may compile (the reviewer's audio tools run ffmpeg).
    expect(directives['script-src']).toEqual(["'self'", "'wasm-unsafe-eval'"]);
    expect(directives['style-src']).toEqual(["'self'", "'unsafe-inline'"]);
    expect(directives['img-src']).toEqual(expect.arrayContaining(["'self'", 'data:', 'blob:']));
    expect(directives['media-src']).toEqual(expect.arrayContaining(["'self'", 'blob:']));
    expect(directives['worker-src']).toEqual(["'self'", 'blob:']);
    expect(directives['connect-src']).toEqual(["'self'"]);
    expect((await request(t.url).get('/api/health')).headers['x-content-type-options']).toBe('nosniff');
  });

  it('answers a malformed JSON body with 400 in the JSON error shape', async () => {
    const response = await request(t.url)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@b.c",');
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
    expect(typeof errorBody(response).message).toBe('string');
  });

  it('serves the OpenAPI UI at /api/docs with bearer auth in the document', async () => {
    expect((await request(t.url).get('/api/docs')).text).toContain('swagger-ui');
    const doc = (await request(t.url).get('/api/docs-json')).body as {
      components: { securitySchemes: Record<string, { scheme: string }> };
    };
    expect(doc.components.securitySchemes.bearer?.scheme).toBe('bearer');
  });
});

describe('boot-time environment check', () => {
  it('refuses to start with a bad PORT, naming the variable', async () => {
    const previous = process.env.PORT;
    process.env.PORT = 'eighty';
    try {
      await jest.isolateModulesAsync(async () => {
        const { NestFactory } = await import('@nestjs/core');
        const { AppModule } = await import('../src/app.module.js');
        await expect(NestFactory.create(AppModule, { logger: false, abortOnError: false })).rejects.toThrow(
          'PORT must be a whole number from 0 to 65535; it is "eighty".',
        );
      });
    } finally {
      if (previous === undefined) delete process.env.PORT;
      else process.env.PORT = previous;
    }
  });
});
