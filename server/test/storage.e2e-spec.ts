import { mkdtemp, rm, readdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import S3rver from 's3rver';
import { LocalObjectStorage } from '../src/storage/local-object-storage';
import { InvalidObjectKeyError, ObjectNotFoundError, readAll, type ObjectStorage } from '../src/storage/object-storage';
import { createS3Client, S3ObjectStorage } from '../src/storage/s3-object-storage';

interface Backend {
  storage: ObjectStorage;
  close(): Promise<void>;
}

// 100 000 bytes with a pattern that shows any shifted or extra byte.
const PAYLOAD = Buffer.from(Array.from({ length: 100_000 }, (_, i) => (i * 7 + (i >> 8)) % 256));

async function startLocal(): Promise<Backend & { root: string }> {
  const root = await mkdtemp(join(tmpdir(), 'yardcall-storage-'));
  const storage = new LocalObjectStorage(join(root, 'objects'));
  await storage.ensureRoot();
  return { storage, root, close: () => rm(root, { recursive: true, force: true }) };
}

// A local S3-compatible fake on loopback, on a port the system picks.
async function startS3(): Promise<Backend> {
  const directory = await mkdtemp(join(tmpdir(), 'yardcall-s3rver-'));
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: 'yardcall-test' }],
  });
  const address = await server.run();
  const client = createS3Client({
    endpoint: `http://127.0.0.1:${address.port}`,
    bucket: 'yardcall-test',
    region: 'us-east-1',
    accessKeyId: 'S3RVER',
    secretAccessKey: 'S3RVER',
  });
  const storage = new S3ObjectStorage(client, 'yardcall-test');
  return {
    storage,
    close: async () => {
      storage.onModuleDestroy();
      await server.close();
      await rm(directory, { recursive: true, force: true });
    },
  };
}

describe.each([
  ['local folder', startLocal],
  ['S3-compatible store (s3rver)', startS3],
] as const)('object storage contract: %s', (_name, start) => {
  let backend: Backend;
  beforeAll(async () => {
    backend = await start();
  });
  afterAll(async () => {
    await backend.close();
  });

  it('keeps a buffer byte for byte with its content type and size', async () => {
    await backend.storage.put('notes/a/buffer.bin', PAYLOAD, { contentType: 'audio/wav' });
    expect(await backend.storage.head('notes/a/buffer.bin')).toEqual({
      sizeBytes: PAYLOAD.length,
      contentType: 'audio/wav',
    });
    expect((await readAll(await backend.storage.get('notes/a/buffer.bin'))).equals(PAYLOAD)).toBe(true);
  });

  it('keeps a stream of known length byte for byte', async () => {
    const stream = Readable.from([PAYLOAD.subarray(0, 30_000), PAYLOAD.subarray(30_000)]);
    await backend.storage.put('notes/a/stream.bin', stream, { contentType: 'audio/ogg', sizeBytes: PAYLOAD.length });
    const back = await readAll(await backend.storage.get('notes/a/stream.bin'));
    expect(back.length).toBe(PAYLOAD.length);
    expect(back.equals(PAYLOAD)).toBe(true);
  });

  it('keeps a stream of unknown length byte for byte', async () => {
    const stream = Readable.from([PAYLOAD.subarray(0, 1_000), PAYLOAD.subarray(1_000)]);
    await backend.storage.put('notes/a/unsized.bin', stream, { contentType: 'audio/webm' });
    expect((await readAll(await backend.storage.get('notes/a/unsized.bin'))).equals(PAYLOAD)).toBe(true);
    expect((await backend.storage.head('notes/a/unsized.bin'))?.sizeBytes).toBe(PAYLOAD.length);
  });

  it('answers an inclusive byte range', async () => {
    const middle = await readAll(await backend.storage.get('notes/a/buffer.bin', { start: 1000, end: 1999 }));
    expect(middle.equals(PAYLOAD.subarray(1000, 2000))).toBe(true);
    const last = await readAll(
      await backend.storage.get('notes/a/buffer.bin', { start: PAYLOAD.length - 1, end: PAYLOAD.length - 1 }),
    );
    expect([...last]).toEqual([PAYLOAD[PAYLOAD.length - 1]]);
  });

  it('overwrites an object under the same key', async () => {
    await backend.storage.put('notes/a/over.bin', Buffer.from('first version'), { contentType: 'text/plain' });
    await backend.storage.put('notes/a/over.bin', Buffer.from('second'), { contentType: 'audio/mpeg' });
    expect((await readAll(await backend.storage.get('notes/a/over.bin'))).toString()).toBe('second');
    expect(await backend.storage.head('notes/a/over.bin')).toEqual({ sizeBytes: 6, contentType: 'audio/mpeg' });
  });

  it('answers null from head and ObjectNotFoundError from get for a missing key', async () => {
    expect(await backend.storage.head('notes/missing.bin')).toBeNull();
    await expect(backend.storage.get('notes/missing.bin')).rejects.toBeInstanceOf(ObjectNotFoundError);
  });

  it('deletes an object, and deleting it again is not an error', async () => {
    await backend.storage.put('notes/a/gone.bin', Buffer.from('x'), { contentType: 'text/plain' });
    await backend.storage.delete('notes/a/gone.bin');
    expect(await backend.storage.head('notes/a/gone.bin')).toBeNull();
    await expect(backend.storage.delete('notes/a/gone.bin')).resolves.toBeUndefined();
  });

  it.each(['../escape.bin', 'notes/../../etc/passwd', '/absolute', 'notes//double', '.hidden', 'a/./b', 'a\\b', ''])(
    'refuses the unsafe key %j',
    async (key) => {
      await expect(backend.storage.put(key, Buffer.from('x'), { contentType: 'text/plain' })).rejects.toBeInstanceOf(
        InvalidObjectKeyError,
      );
      await expect(backend.storage.get(key)).rejects.toBeInstanceOf(InvalidObjectKeyError);
    },
  );
});

describe('local folder storage', () => {
  it('creates its folder when missing and keeps files only inside it', async () => {
    const local = await startLocal();
    try {
      await local.storage.put('photos/p1.jpg', Buffer.from('jpeg'), { contentType: 'image/jpeg' });
      expect(await readdir(join(local.root, 'objects', 'data', 'photos'))).toEqual(['p1.jpg']);
      // No half-written files are left behind.
      expect(await readdir(join(local.root, 'objects', 'tmp'))).toEqual([]);
    } finally {
      await local.close();
    }
  });
});
