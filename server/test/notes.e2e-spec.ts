import { NOTES_STORAGE_DIR } from './notes-storage-dir';
import {
  NOTE_MAX_BYTES,
  PHOTO_MAX_BYTES,
  type InspectionResponse,
  type PhotoResponse,
  type VoiceNoteResponse,
} from '@yardcall/shared';
import { createHash, randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { readFile, rm } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import request from 'supertest';
import {
  bearer,
  binary,
  bodyOf,
  createdBody,
  errorBody,
  newTractor,
  OTHER_ORG_ADMIN,
  SECOND_DRIVER,
  signIn,
  startInspection,
  suiteApp,
} from './helpers';
import { makeOggOpusHead, makePng, makeWav } from './media-fixtures';

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

describe('voice notes and photos', () => {
  const { t, tokens } = suiteApp();
  let otherAdmin: string;
  let inspection: InspectionResponse;
  let itemKey: string;
  const wav = makeWav(250);

  beforeAll(async () => {
    otherAdmin = await signIn(t.url, OTHER_ORG_ADMIN);
    inspection = await newInspection();
    itemKey = inspection.checklist.items[0]!.key;
  });
  afterAll(async () => {
    await rm(dirname(NOTES_STORAGE_DIR), { recursive: true, force: true });
  });

  async function newInspection(): Promise<InspectionResponse> {
    const vehicle = await newTractor(t.url, tokens.admin, 'NT');
    return startInspection(t.url, tokens.driver, { vehicleIds: [vehicle.id] });
  }

  interface NoteFields {
    itemKey?: string;
    clientId?: string;
    durationMs?: string;
    heard?: string;
  }

  function uploadNote(id: string, file: Buffer, fields: NoteFields = {}, token = tokens.driver) {
    const call = request(t.url)
      .post(`/api/inspections/${id}/notes`)
      .set(bearer(token))
      .field('itemKey', fields.itemKey ?? itemKey)
      .field('clientId', fields.clientId ?? randomUUID())
      .field('durationMs', fields.durationMs ?? '250');
    if (fields.heard) void call.field('heard', fields.heard);
    return call.attach('file', file, { filename: 'note.bin', contentType: 'application/octet-stream' });
  }

  function uploadPhoto(id: string, file: Buffer, clientId = randomUUID()) {
    return request(t.url)
      .post(`/api/inspections/${id}/photos`)
      .set(bearer(tokens.driver))
      .field('itemKey', itemKey)
      .field('clientId', clientId)
      .attach('file', file, { filename: 'photo.bin', contentType: 'application/octet-stream' });
  }

  async function storedNote(id: string) {
    const [row] = await t.dataSource.query<{ object_key: string; size_bytes: number; sha256: string }[]>(
      'SELECT object_key, size_bytes, sha256 FROM voice_notes WHERE id = $1',
      [id],
    );
    return row!;
  }

  describe('uploading a voice note', () => {
    it('accepts a small WAV, judges its type by content and keeps its size and sha256', async () => {
      const response = await uploadNote(inspection.id, wav, { heard: 'air line chafed at the gladhand' });
      const note = createdBody<VoiceNoteResponse>(response);
      expect(note).toMatchObject({
        itemKey,
        mimeType: 'audio/wav',
        sizeBytes: wav.length,
        sha256: sha256(wav),
        durationMs: 250,
        heard: 'air line chafed at the gladhand',
        audioUrl: `/api/notes/${note.id}/audio`,
      });
      const row = await storedNote(note.id);
      expect(row).toMatchObject({ size_bytes: wav.length, sha256: sha256(wav) });
      const onDisk = await readFile(join(NOTES_STORAGE_DIR, 'data', row.object_key));
      expect(onDisk.equals(wav)).toBe(true);
    });

    it('takes an Ogg Opus recording as audio/ogg', async () => {
      const response = await uploadNote(inspection.id, makeOggOpusHead());
      expect(response.status).toBe(201);
      expect(bodyOf<VoiceNoteResponse>(response).mimeType).toBe('audio/ogg');
    });

    it('stores the same upload sent twice once, and answers the first note again with 200', async () => {
      const clientId = randomUUID();
      const first = await uploadNote(inspection.id, wav, { clientId });
      const second = await uploadNote(inspection.id, wav, { clientId });
      expect([first.status, second.status]).toEqual([201, 200]);
      expect(bodyOf<VoiceNoteResponse>(second)).toEqual(bodyOf<VoiceNoteResponse>(first));
      const [count] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM voice_notes WHERE inspection_id = $1 AND client_id = $2',
        [inspection.id, clientId],
      );
      expect(count?.n).toBe(1);
    });

    it('keeps one note when the same upload arrives twice at once', async () => {
      const clientId = randomUUID();
      const answers = await Promise.all([
        uploadNote(inspection.id, wav, { clientId }),
        uploadNote(inspection.id, wav, { clientId }),
      ]);
      expect(answers.map((a) => a.status).sort()).toEqual([200, 201]);
      expect(new Set(answers.map((a) => bodyOf<VoiceNoteResponse>(a).id)).size).toBe(1);
      const rows = await t.dataSource.query<{ object_key: string }[]>(
        'SELECT object_key FROM voice_notes WHERE inspection_id = $1 AND client_id = $2',
        [inspection.id, clientId],
      );
      expect(rows).toHaveLength(1);
    });

    it('refuses a clientId reused for a different recording with 409', async () => {
      const clientId = randomUUID();
      expect((await uploadNote(inspection.id, wav, { clientId })).status).toBe(201);
      const other = await uploadNote(inspection.id, makeWav(300), { clientId });
      expect(other.status).toBe(409);
      expect(errorBody(other).message).toMatch(/already used for a different file/);
    });

    it('refuses a file over the limit with 413 naming the limit', async () => {
      const big = Buffer.concat([makeWav(100), Buffer.alloc(NOTE_MAX_BYTES)]);
      const response = await uploadNote(inspection.id, big);
      expect(response.status).toBe(413);
      expect(errorBody(response).message).toBe(
        `The file is larger than the 10 MB (${NOTE_MAX_BYTES} bytes) allowed for a voice note: record a shorter one or send a smaller file.`,
      );
    });

    it('refuses an empty file with 400', async () => {
      const response = await uploadNote(inspection.id, Buffer.alloc(0));
      expect(response.status).toBe(400);
      expect(errorBody(response).message).toBe('The file is empty (0 bytes): send a voice note with something in it.');
    });

    it('refuses a file that is not audio with 400 naming the type found', async () => {
      const png = await uploadNote(inspection.id, makePng());
      expect(png.status).toBe(400);
      expect(errorBody(png).message).toBe(
        'This file is not WebM, Ogg, MP4/M4A, MP3 or WAV audio: its content looks like image/png. Send a voice note as WebM, Ogg, MP4/M4A, MP3 or WAV audio.',
      );
      const text = await uploadNote(inspection.id, Buffer.from('just some words, not a recording'));
      expect(text.status).toBe(400);
      expect(errorBody(text).message).toMatch(/its content is of no type we recognise/);
    });

    it('refuses a request without a file, naming the field', async () => {
      const response = await request(t.url)
        .post(`/api/inspections/${inspection.id}/notes`)
        .set(bearer(tokens.driver))
        .field('itemKey', itemKey)
        .field('clientId', randomUUID())
        .field('durationMs', '100');
      expect(response.status).toBe(400);
      expect(errorBody(response).message).toMatch(/as the form field "file"/);
    });

    it('refuses an item key that is not on the checklist, naming the field', async () => {
      const response = await uploadNote(inspection.id, wav, { itemKey: 'u9.nowhere.thing' });
      expect(response.status).toBe(400);
      expect(errorBody(response).fields).toEqual([
        { field: 'itemKey', message: `"u9.nowhere.thing" is not an item of this inspection's checklist.` },
      ]);
    });

    it('refuses a wrong duration, naming the field', async () => {
      const response = await uploadNote(inspection.id, wav, { durationMs: 'long' });
      expect(response.status).toBe(400);
      expect(errorBody(response).fields?.map((f) => f.field)).toEqual(['durationMs']);
    });

    it("refuses anyone but the inspection's driver: another driver gets 404, other roles 403", async () => {
      const otherDriver = await signIn(t.url, SECOND_DRIVER);
      const response = await uploadNote(inspection.id, wav, {}, otherDriver);
      expect(response.status).toBe(404);
      expect(errorBody(response).message).toMatch(/inspection/i);
      for (const token of [tokens.mechanic, tokens.supervisor, otherAdmin]) {
        expect((await uploadNote(inspection.id, wav, {}, token)).status).toBe(403);
      }
      expect((await uploadNote(randomUUID(), wav)).status).toBe(404);
      const [count] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM voice_notes WHERE inspection_id = $1',
        [inspection.id],
      );
      const before = count?.n;
      expect((await uploadNote(inspection.id, wav, {}, otherDriver)).status).toBe(404);
      const [after] = await t.dataSource.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM voice_notes WHERE inspection_id = $1',
        [inspection.id],
      );
      expect(after?.n).toBe(before);
    });
  });

  describe('listening to a voice note', () => {
    let note: VoiceNoteResponse;
    beforeAll(async () => {
      note = bodyOf<VoiceNoteResponse>(await uploadNote(inspection.id, wav));
    });

    const audio = (range?: string, token = tokens.supervisor) => {
      const call = binary(request(t.url).get(`/api/notes/${note.id}/audio`).set(bearer(token)));
      return range ? call.set('Range', range) : call;
    };

    it('streams the whole recording with its type, length and Accept-Ranges', async () => {
      const response = await audio();
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('audio/wav');
      expect(response.headers['accept-ranges']).toBe('bytes');
      expect(response.headers['content-length']).toBe(String(wav.length));
      expect((response.body as Buffer).equals(wav)).toBe(true);
    });

    it.each([
      ['bytes=0-99', 0, 99],
      ['bytes=44-', 44, wav.length - 1],
      ['bytes=-10', wav.length - 10, wav.length - 1],
      [`bytes=100-${wav.length + 500}`, 100, wav.length - 1],
    ])('answers %s with 206 and exactly those bytes', async (range, start, end) => {
      const response = await audio(range);
      expect(response.status).toBe(206);
      expect(response.headers['content-range']).toBe(`bytes ${start}-${end}/${wav.length}`);
      expect(response.headers['content-length']).toBe(String(end - start + 1));
      expect(response.headers['content-type']).toBe('audio/wav');
      expect((response.body as Buffer).equals(wav.subarray(start, end + 1))).toBe(true);
    });

    it('answers a range past the end with 416 and the size', async () => {
      const response = await request(t.url)
        .get(`/api/notes/${note.id}/audio`)
        .set(bearer(tokens.supervisor))
        .set('Range', `bytes=${wav.length}-`);
      expect(response.status).toBe(416);
      expect(response.headers['content-range']).toBe(`bytes */${wav.length}`);
      expect(errorBody(response).message).toContain(`has ${wav.length} bytes`);
    });

    it('lets the driver, a supervisor and a mechanic of the organisation listen', async () => {
      for (const role of ['driver', 'supervisor', 'mechanic', 'admin'] as const) {
        expect({ role, status: (await audio(undefined, tokens[role])).status }).toEqual({ role, status: 200 });
      }
    });

    it("answers 404 for another organisation's note, as if it did not exist", async () => {
      const response = await request(t.url).get(`/api/notes/${note.id}/audio`).set(bearer(otherAdmin));
      expect(response.status).toBe(404);
      expect(errorBody(response).message).toBe('No voice note with this id in your organisation.');
      expect((await request(t.url).get(`/api/notes/${randomUUID()}/audio`).set(bearer(tokens.admin))).status).toBe(404);
    });

    it('lists the note with the inspection', async () => {
      const response = await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(tokens.driver));
      expect(bodyOf<InspectionResponse>(response).notes).toContainEqual(note);
    });
  });

  describe('photos', () => {
    it('accepts a PNG, serves it back byte for byte and lists it with the inspection', async () => {
      const png = makePng();
      const response = await uploadPhoto(inspection.id, png);
      const photo = createdBody<PhotoResponse>(response);
      expect(photo).toMatchObject({
        itemKey,
        mimeType: 'image/png',
        sizeBytes: png.length,
        url: `/api/photos/${photo.id}`,
      });
      const image = await binary(request(t.url).get(photo.url).set(bearer(tokens.mechanic)));
      expect(image.status).toBe(200);
      expect(image.headers['content-type']).toBe('image/png');
      expect((image.body as Buffer).equals(png)).toBe(true);
      const detail = await request(t.url).get(`/api/inspections/${inspection.id}`).set(bearer(tokens.supervisor));
      expect(bodyOf<InspectionResponse>(detail).photos).toContainEqual(photo);
      expect((await request(t.url).get(photo.url).set(bearer(otherAdmin))).status).toBe(404);
    });

    it('refuses audio sent as a photo, and a photo over its limit', async () => {
      const sound = await uploadPhoto(inspection.id, wav);
      expect(sound.status).toBe(400);
      expect(errorBody(sound).message).toBe(
        'This file is not JPEG, PNG or WebP images: its content looks like audio/wav. Send a photo as JPEG, PNG or WebP images.',
      );
      const big = await uploadPhoto(inspection.id, Buffer.concat([makePng(), Buffer.alloc(PHOTO_MAX_BYTES)]));
      expect(big.status).toBe(413);
      expect(errorBody(big).message).toContain(`8 MB (${PHOTO_MAX_BYTES} bytes) allowed for a photo`);
    });
  });

  describe('after the inspection is submitted', () => {
    it('refuses a new note with 409 but still answers a retried one', async () => {
      const own = await newInspection();
      const clientId = randomUUID();
      const key = own.checklist.items[0]!.key;
      expect((await uploadNote(own.id, wav, { clientId, itemKey: key })).status).toBe(201);
      const submit = await request(t.url)
        .post(`/api/inspections/${own.id}/submit`)
        .set(bearer(tokens.driver))
        .send({ signature: { name: 'Dana Okafor' } });
      expect(submit.status).toBeLessThan(300);
      const retry = await uploadNote(own.id, wav, { clientId, itemKey: key });
      expect(retry.status).toBe(200);
      const late = await uploadNote(own.id, wav, { itemKey: key });
      expect(late.status).toBe(409);
      expect(errorBody(late).message).toMatch(/has been submitted/);
      expect(existsSync(NOTES_STORAGE_DIR)).toBe(true);
    });
  });
});
