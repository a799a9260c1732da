import { NOTES_STORAGE_DIR } from './notes-storage-dir';
import {
  scoreNarration,
  type NarrationSegment,
  type PutTrainingSegmentsResponse,
  type TrainingAttemptListItem,
  type TrainingAttemptResponse,
  type TrainingProgress,
  type UserSummary,
  type VehicleResponse,
} from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import { rm } from 'node:fs/promises';
import { dirname } from 'node:path';
import request from 'supertest';
import { bearer, binary, bodyOf, createdBody, errorBody, OTHER_ORG_ADMIN, signIn, suiteApp } from './helpers';
import { makePng, makeWav } from './media-fixtures';

const STUDENT = 'student@yardcall.test';
const OTHER_STUDENT = 'noor.haddad@yardcall.test';

// What a student might say at the front of a tractor, with the recogniser's lower case and no punctuation.
const NARRATION: (NarrationSegment & { seq: number })[] = [
  { seq: 0, text: 'starting at the front checking the headlights and the windshield', startMs: 1000, endMs: 4200 },
  { seq: 1, text: 'engine oil level is good coolant level is good', startMs: 5000, endMs: 8800 },
  { seq: 2, text: 'left steer tire tread depth looks good no cuts or bulges', startMs: 9500, endMs: 13900 },
];

describe('training: narrated practice attempts and reviews', () => {
  const { t, tokens } = suiteApp();
  let student: string;
  let otherStudent: string;
  let otherAdmin: string;
  let tractor: VehicleResponse;

  beforeAll(async () => {
    student = await signIn(t.url, STUDENT);
    otherStudent = await signIn(t.url, OTHER_STUDENT);
    otherAdmin = await signIn(t.url, OTHER_ORG_ADMIN);
    const vehicles = bodyOf<VehicleResponse[]>(await request(t.url).get('/api/vehicles').set(bearer(student)));
    tractor = vehicles.find((v) => v.unitNumber === 'KV-101')!;
  });
  afterAll(async () => {
    await rm(dirname(NOTES_STORAGE_DIR), { recursive: true, force: true });
  });

  function create(token: string, clientId = randomUUID()) {
    return request(t.url)
      .post('/api/training/attempts')
      .set(bearer(token))
      .send({ clientId, vehicleIds: [tractor.id], startedAt: new Date(Date.now() - 60_000).toISOString() });
  }

  async function newAttempt(token = student): Promise<TrainingAttemptResponse> {
    const response = await create(token);
    return createdBody<TrainingAttemptResponse>(response);
  }

  function putSegments(token: string, id: string, segments: unknown[]) {
    return request(t.url).put(`/api/training/attempts/${id}/segments`).set(bearer(token)).send({ segments });
  }

  function finish(token: string, id: string, extra: Record<string, unknown> = {}) {
    return request(t.url)
      .post(`/api/training/attempts/${id}/finish`)
      .set(bearer(token))
      .send({ finishedAt: new Date().toISOString(), durationMs: 14_000, ...extra });
  }

  function uploadAudio(token: string, id: string, file: Buffer, name = 'narration.wav') {
    return request(t.url)
      .post(`/api/training/attempts/${id}/audio`)
      .set(bearer(token))
      .field('durationMs', '14000')
      .attach('file', file, { filename: name, contentType: 'audio/wav' });
  }

  async function finishedAttempt(token = student): Promise<TrainingAttemptResponse> {
    const attempt = await newAttempt(token);
    expect((await putSegments(token, attempt.id, NARRATION)).status).toBe(200);
    const done = await finish(token, attempt.id);
    expect(done.status).toBe(200);
    return bodyOf<TrainingAttemptResponse>(done);
  }

  it('creates a practice attempt once per client id, with the practice checklist', async () => {
    const clientId = randomUUID();
    const first = await create(student, clientId);
    expect(first.status).toBe(201);
    const again = await create(student, clientId);
    expect(again.status).toBe(200);
    const a = bodyOf<TrainingAttemptResponse>(first);
    expect(bodyOf<TrainingAttemptResponse>(again).id).toBe(a.id);
    expect(a).toMatchObject({ kind: 'practice', status: 'recording', segments: [], score: null, review: null });
    expect(a.vehicles).toEqual([{ id: tractor.id, unitNumber: 'KV-101', kind: 'tractor' }]);
    expect(a.checklist.kind).toBe('practice');
  });

  it('refuses a driver who is not a student with a sentence saying why', async () => {
    const response = await create(tokens.driver);
    expect(response.status).toBe(403);
    expect(errorBody(response).message).toMatch(/marked as students/);
  });

  it('merges segments by number, so a batch sent again changes nothing', async () => {
    const attempt = await newAttempt();
    const first = await putSegments(student, attempt.id, NARRATION.slice(0, 2));
    expect(bodyOf<PutTrainingSegmentsResponse>(first)).toEqual({ segmentCount: 2 });
    const again = await putSegments(student, attempt.id, NARRATION.slice(0, 2));
    expect(bodyOf<PutTrainingSegmentsResponse>(again)).toEqual({ segmentCount: 2 });
    const more = await putSegments(student, attempt.id, NARRATION.slice(1));
    expect(bodyOf<PutTrainingSegmentsResponse>(more)).toEqual({ segmentCount: 3 });
    const read = bodyOf<TrainingAttemptResponse>(
      await request(t.url).get(`/api/training/attempts/${attempt.id}`).set(bearer(student)),
    );
    expect(read.segments).toEqual(NARRATION.map(({ text, startMs, endMs }) => ({ text, startMs, endMs })));
    const backwards = await putSegments(student, attempt.id, [{ seq: 9, text: 'x', startMs: 500, endMs: 100 }]);
    expect(backwards.status).toBe(400);
    expect(errorBody(backwards).fields).toEqual([
      { field: 'segments.0.endMs', message: 'A segment cannot end before it starts.' },
    ]);
  });

  it('scores on the server with the shared scorer and refuses a score sent by the client', async () => {
    const attempt = await newAttempt();
    await putSegments(student, attempt.id, NARRATION);
    const forged = await finish(student, attempt.id, {
      score: { overall: { namedFraction: 1, creditFraction: 1 } },
    });
    expect(forged.status).toBe(400);
    expect(errorBody(forged).fields).toEqual([
      { field: 'score', message: 'This field is not allowed here: remove it.' },
    ]);

    const done = await finish(student, attempt.id);
    expect(done.status).toBe(200);
    const finished = bodyOf<TrainingAttemptResponse>(done);
    expect(finished.status).toBe('finished');
    const expected = scoreNarration(finished.segments, finished.checklist);
    expect(finished.score).toEqual(expected);
    expect(finished.coverage).toEqual(expected.overall);
    const statuses = new Set(finished.score!.items.map((item) => item.status));
    expect(statuses.has('named')).toBe(true);
    expect(statuses.has('missed')).toBe(true);
    const named = finished.score!.items.find((item) => item.status === 'named')!;
    expect(named.firstNamedMs).toBeGreaterThanOrEqual(1000);

    // Finished: the same call answers the stored attempt; new segments are refused.
    const twice = await finish(student, attempt.id);
    expect(bodyOf<TrainingAttemptResponse>(twice).score).toEqual(expected);
    expect((await putSegments(student, attempt.id, NARRATION)).status).toBe(200);
    const late = await putSegments(student, attempt.id, [
      { seq: 7, text: 'rear lights', startMs: 20000, endMs: 21000 },
    ]);
    expect(late.status).toBe(409);
  });

  it('keeps the recording, judged by its content, and serves it with Range', async () => {
    const attempt = await newAttempt();
    const wav = makeWav(400);
    const stored = await uploadAudio(student, attempt.id, wav);
    expect(stored.status).toBe(201);
    expect(bodyOf<TrainingAttemptResponse>(stored).audio).toMatchObject({
      mimeType: 'audio/wav',
      sizeBytes: wav.length,
      durationMs: 14000,
      audioUrl: `/api/training/attempts/${attempt.id}/audio`,
    });
    expect((await uploadAudio(student, attempt.id, wav)).status).toBe(200);
    expect((await uploadAudio(student, attempt.id, makeWav(300))).status).toBe(409);

    const notAudio = await uploadAudio(student, (await newAttempt()).id, makePng(), 'narration.wav');
    expect(notAudio.status).toBe(400);
    expect(errorBody(notAudio).message).toMatch(/looks like image\/png/);

    const whole = await binary(
      request(t.url).get(`/api/training/attempts/${attempt.id}/audio`).set(bearer(tokens.trainer)),
    );
    expect(whole.status).toBe(200);
    expect(Buffer.compare(whole.body as Buffer, wav)).toBe(0);
    const part = await binary(
      request(t.url).get(`/api/training/attempts/${attempt.id}/audio`).set(bearer(student)).set('Range', 'bytes=10-19'),
    );
    expect(part.status).toBe(206);
    expect(part.headers['content-range']).toBe(`bytes 10-19/${wav.length}`);
    expect(Buffer.compare(part.body as Buffer, wav.subarray(10, 20))).toBe(0);
    const outside = await request(t.url)
      .get(`/api/training/attempts/${attempt.id}/audio`)
      .set(bearer(student))
      .set('Range', `bytes=${wav.length + 10}-`);
    expect(outside.status).toBe(416);
  });

  it("answers 404 for another student's attempt, as if it did not exist", async () => {
    const attempt = await finishedAttempt();
    const read = await request(t.url).get(`/api/training/attempts/${attempt.id}`).set(bearer(otherStudent));
    expect(read.status).toBe(404);
    expect(errorBody(read).message).toBe('No practice attempt with this id in your organisation.');
    // Another organisation's admin has no training role at all.
    expect((await request(t.url).get(`/api/training/attempts/${attempt.id}`).set(bearer(otherAdmin))).status).toBe(403);
    expect(
      (await request(t.url).get(`/api/training/attempts/${attempt.id}/audio`).set(bearer(otherStudent))).status,
    ).toBe(404);
    expect((await putSegments(otherStudent, attempt.id, NARRATION)).status).toBe(404);
    expect((await finish(otherStudent, attempt.id)).status).toBe(404);
    expect((await uploadAudio(otherStudent, attempt.id, makeWav(200))).status).toBe(404);
    const theirs = bodyOf<TrainingAttemptListItem[]>(
      await request(t.url).get('/api/training/attempts').set(bearer(otherStudent)),
    );
    expect(theirs.map((a) => a.id)).not.toContain(attempt.id);
  });

  it('lets only a trainer review, and the student then sees the feedback and progress', async () => {
    const attempt = await finishedAttempt();
    const [first, second] = attempt.checklist.items;
    const review = {
      grade: 'needs_practice',
      comment: 'Good start: name each tire position as you reach it.',
      marks: [
        { itemKey: first!.key, mark: 'named', comment: 'Clear.' },
        { itemKey: second!.key, mark: 'missed' },
      ],
    };
    const path = `/api/training/attempts/${attempt.id}/review`;
    expect((await request(t.url).put(path).set(bearer(student)).send(review)).status).toBe(403);
    expect((await request(t.url).put(path).set(bearer(tokens.supervisor)).send(review)).status).toBe(403);
    expect((await request(t.url).put(path).set(bearer(otherAdmin)).send(review)).status).toBe(403);
    const wrongKey = await request(t.url)
      .put(path)
      .set(bearer(tokens.trainer))
      .send({ ...review, marks: [{ itemKey: 'no.such.item', mark: 'named' }] });
    expect(wrongKey.status).toBe(400);
    expect(errorBody(wrongKey).fields?.[0]?.field).toBe('marks.0.itemKey');

    const unfinished = await newAttempt();
    const early = await request(t.url)
      .put(`/api/training/attempts/${unfinished.id}/review`)
      .set(bearer(tokens.trainer))
      .send(review);
    expect(early.status).toBe(409);

    const waiting = bodyOf<TrainingAttemptListItem[]>(
      await request(t.url).get('/api/training/attempts?review=waiting').set(bearer(tokens.trainer)),
    );
    expect(waiting.map((a) => a.id)).toContain(attempt.id);

    const saved = await request(t.url).put(path).set(bearer(tokens.trainer)).send(review);
    expect(saved.status).toBe(200);
    const trainerName = bodyOf<UserSummary>(await request(t.url).get('/api/auth/me').set(bearer(tokens.trainer))).name;
    expect(bodyOf<TrainingAttemptResponse>(saved).review).toMatchObject({
      trainer: { name: trainerName },
      grade: 'needs_practice',
      comment: review.comment,
      marks: [
        { itemKey: first!.key, mark: 'named', comment: 'Clear.' },
        { itemKey: second!.key, mark: 'missed', comment: '' },
      ],
    });
    // Saved again, the review is replaced.
    const regraded = await request(t.url)
      .put(path)
      .set(bearer(tokens.trainer))
      .send({ ...review, grade: 'pass' });
    expect(bodyOf<TrainingAttemptResponse>(regraded).review?.grade).toBe('pass');

    const seen = bodyOf<TrainingAttemptResponse>(
      await request(t.url).get(`/api/training/attempts/${attempt.id}`).set(bearer(student)),
    );
    expect(seen.review).toMatchObject({ grade: 'pass', comment: review.comment });
    const mine = bodyOf<TrainingAttemptListItem[]>(
      await request(t.url).get('/api/training/attempts').set(bearer(student)),
    );
    expect(mine.find((a) => a.id === attempt.id)).toMatchObject({ grade: 'pass', status: 'finished' });
    expect(mine.every((a) => a.student.name === 'Jordan Pike')).toBe(true);

    const progress = bodyOf<TrainingProgress>(await request(t.url).get('/api/training/progress').set(bearer(student)));
    expect(progress.student.name).toBe('Jordan Pike');
    const point = progress.attempts.find((p) => p.attemptId === attempt.id)!;
    expect(point).toMatchObject({ grade: 'pass', coveragePercent: Math.round(attempt.coverage!.namedFraction * 100) });
    const dates = progress.attempts.map((p) => p.date);
    expect([...dates].sort()).toEqual(dates);

    const meId = progress.student.id;
    const byTrainer = await request(t.url).get(`/api/training/progress?studentId=${meId}`).set(bearer(tokens.trainer));
    expect(bodyOf<TrainingProgress>(byTrainer).attempts).toEqual(progress.attempts);
    expect((await request(t.url).get('/api/training/progress').set(bearer(tokens.trainer))).status).toBe(400);
    expect(
      (await request(t.url).get(`/api/training/progress?studentId=${meId}`).set(bearer(otherStudent))).status,
    ).toBe(404);
    const filtered = bodyOf<TrainingAttemptListItem[]>(
      await request(t.url).get(`/api/training/attempts?studentId=${meId}`).set(bearer(tokens.trainer)),
    );
    expect(filtered.length).toBeGreaterThan(0);
    expect(filtered.every((a) => a.student.id === meId)).toBe(true);
  });
});
