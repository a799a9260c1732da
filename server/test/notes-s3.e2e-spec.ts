import type { InspectionResponse, VehicleResponse, VoiceNoteResponse } from '@yardcall/shared';
import { randomInt, randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import request from 'supertest';
import { readAll } from '../src/storage/object-storage';
import { createS3Client, S3ObjectStorage } from '../src/storage/s3-object-storage';
import type * as Helpers from './helpers';
import { makeWav } from './media-fixtures';

const BUCKET = 'yardcall-notes-e2e';

// The whole app configured for an S3-compatible store (s3rver on loopback) by environment alone.
describe('voice notes on an S3-compatible store', () => {
  let server: S3rver;
  let directory: string;
  let endpoint: string;
  let helpers: typeof Helpers;
  let t: Helpers.TestApp;

  beforeAll(async () => {
    directory = await mkdtemp(join(tmpdir(), 'yardcall-s3-app-'));
    server = new S3rver({
      address: '127.0.0.1',
      port: 0,
      silent: true,
      directory,
      configureBuckets: [{ name: BUCKET }],
    });
    endpoint = `http://127.0.0.1:${(await server.run()).port}`;
    Object.assign(process.env, {
      S3_ENDPOINT: endpoint,
      S3_BUCKET: BUCKET,
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
      STORAGE_DIR: join(directory, 'must-stay-unused'),
    });
    // Loaded only now: the app reads its configuration when AppModule is first imported.
    helpers = await import('./helpers.js');
    t = await helpers.startApp();
  });
  afterAll(async () => {
    await t.close();
    await server.close();
    await rm(directory, { recursive: true, force: true });
  });

  it('stores the upload in the bucket and streams ranges from it', async () => {
    const { bearer, bodyOf, createdBody, login, ROLE_EMAILS } = helpers;
    const admin = (await login(t.url, ROLE_EMAILS.admin)).accessToken;
    const driver = (await login(t.url, ROLE_EMAILS.driver)).accessToken;
    const vehicles = bodyOf<VehicleResponse[]>(await request(t.url).get('/api/vehicles').set(bearer(admin)));
    const template = vehicles.find((v) => v.kind === 'tractor')!;
    const vehicle = bodyOf<VehicleResponse>(
      await request(t.url)
        .post('/api/vehicles')
        .set(bearer(admin))
        .send({
          unitNumber: `S3-${randomInt(10_000, 99_999)}`,
          kind: 'tractor',
          vin: template.vin,
          plate: template.plate,
          config: template.config,
        }),
    );
    const started = await request(t.url)
      .post('/api/inspections')
      .set(bearer(driver))
      .send({
        vehicleIds: [vehicle.id],
        kind: 'pre_trip',
        startedAt: new Date().toISOString(),
        clientId: randomUUID(),
      });
    const inspection = createdBody<InspectionResponse>(started);

    const wav = makeWav(200);
    const upload = await request(t.url)
      .post(`/api/inspections/${inspection.id}/notes`)
      .set(bearer(driver))
      .field('itemKey', inspection.checklist.items[0]!.key)
      .field('clientId', randomUUID())
      .field('durationMs', '200')
      .attach('file', wav, { filename: 'n.wav', contentType: 'audio/wav' });
    const note = createdBody<VoiceNoteResponse>(upload);

    const [row] = await t.dataSource.query<{ object_key: string }[]>(
      'SELECT object_key FROM voice_notes WHERE id = $1',
      [note.id],
    );
    const bucket = new S3ObjectStorage(
      createS3Client({
        endpoint,
        bucket: BUCKET,
        region: 'us-east-1',
        accessKeyId: 'S3RVER',
        secretAccessKey: 'S3RVER',
      }),
      BUCKET,
    );
    try {
      expect((await readAll(await bucket.get(row!.object_key))).equals(wav)).toBe(true);
    } finally {
      bucket.onModuleDestroy();
    }

    const range = await request(t.url)
      .get(note.audioUrl)
      .set(bearer(driver))
      .set('Range', 'bytes=40-59')
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(existsSync(join(directory, 'must-stay-unused'))).toBe(false);
    expect(range.status).toBe(206);
    expect(range.headers['content-range']).toBe(`bytes 40-59/${wav.length}`);
    expect((range.body as Buffer).equals(wav.subarray(40, 60))).toBe(true);
  });
});
