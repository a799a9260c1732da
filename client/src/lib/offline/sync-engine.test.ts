import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Checklist, CreateInspectionRequest, ResultUpsert } from '@yardcall/shared';
import { ApiError, tokenStore } from '../api-client';
import { createFakeSyncServer } from './fake-sync-server';
import { openOfflineDb, type OfflineDb } from './offline-db';
import { createOfflineStore, type OfflineStore } from './offline-store';
import { createSyncEngine, isRetryable, type SyncEngine, type SyncEngineOptions } from './sync-engine';

const checklist: Checklist = { kind: 'pre_trip', locale: 'en', zones: [], stops: [], items: [] };

function createRequest(clientId: string): CreateInspectionRequest {
  return {
    clientId,
    vehicleIds: ['veh-tractor-418', 'veh-trailer-5302'],
    kind: 'pre_trip',
    startedAt: '2026-12-01T05:40:00.000Z',
  };
}

function result(clientId: string, itemKey: string, answer: ResultUpsert['answer'] = 'pass'): ResultUpsert {
  return { clientId, itemKey, answer, answeredAt: '2026-12-01T05:41:00.000Z' };
}

const urlOf = (input: RequestInfo | URL): string =>
  typeof input === 'string' ? input : input instanceof URL ? input.href : input.url;
const bodyOf = (init: RequestInit | undefined): string => (typeof init?.body === 'string' ? init.body : '');

const resultIds = (count: number, prefix = 'r') =>
  Array.from({ length: count }, (_, index) => `${prefix}-${index + 1}`);

// Generous: the machine is shared and fake-indexeddb is slow under load.
const WAIT = { timeout: 10_000 };

let dbCounter = 0;
const opened: OfflineDb[] = [];
const engines: SyncEngine[] = [];
let online = true;

function openStore(name: string): OfflineStore {
  const db = openOfflineDb(name);
  opened.push(db);
  return createOfflineStore(db);
}

function engineFor(store: OfflineStore, options: Partial<SyncEngineOptions> = {}): SyncEngine {
  const engine = createSyncEngine({ store, debounceMs: 5, retryDelayMs: () => 5, isOnline: () => online, ...options });
  engines.push(engine);
  return engine;
}

async function saveInspectionWithResults(store: OfflineStore, inspectionId: string, ids: string[]): Promise<void> {
  await store.saveInspection({ request: createRequest(inspectionId), vehicles: [], checklist });
  // One write per answer, as the voice loop makes them.
  for (const id of ids) await store.saveResults(inspectionId, [result(id, `item.${id}`)]);
}

let server: ReturnType<typeof createFakeSyncServer>;
let dbName: string;

beforeEach(() => {
  online = true;
  dbCounter += 1;
  dbName = `sync-test-${dbCounter}`;
  server = createFakeSyncServer();
  vi.stubGlobal('fetch', vi.fn(server.fetch));
  tokenStore.set('driver-token');
});

afterEach(async () => {
  for (const engine of engines.splice(0)) {
    engine.stop();
    await engine.idle();
  }
  for (const db of opened.splice(0)) db.close();
  vi.unstubAllGlobals();
});

// Writing hundreds of rows into fake-indexeddb takes seconds on a busy machine.
describe('sync engine', { timeout: 30_000 }, () => {
  it('keeps 150 answers written offline through a reload and sends each exactly once when back online', async () => {
    online = false;
    const before = openStore(dbName);
    const firstEngine = engineFor(before);
    await firstEngine.start();
    const ids = resultIds(150);
    await saveInspectionWithResults(before, 'insp-a', ids);
    await new Promise((resolve) => setTimeout(resolve, 30));
    await firstEngine.idle();
    expect(fetch).not.toHaveBeenCalled();
    expect(firstEngine.getStatus().waiting).toBe(151);

    // The page reloads: a new connection on the same database, a new engine.
    firstEngine.stop();
    before.db.close();
    const after = openStore(dbName);
    const engine = engineFor(after);
    await engine.start();
    expect(engine.getStatus().waiting).toBe(151);

    online = true;
    window.dispatchEvent(new Event('online'));
    await engine.idle();

    expect(server.createRequests.map((request) => request.clientId)).toEqual(['insp-a']);
    expect([...server.receivedResultIds].sort()).toEqual([...ids].sort());
    expect(new Set(server.receivedResultIds).size).toBe(150);
    expect(engine.getStatus()).toMatchObject({ waiting: 0, syncing: false });
    expect(engine.getStatus().lastSyncedAt).toBeDefined();
    expect((await after.getResults('insp-a')).every((row) => row.synced === 1)).toBe(true);
  });

  it('sends results in batches of at most 150 in the order they were written', async () => {
    const store = openStore(dbName);
    const ids = resultIds(320);
    await saveInspectionWithResults(store, 'insp-a', ids);
    const engine = engineFor(store);
    await engine.syncNow();

    const puts = vi.mocked(fetch).mock.calls.filter(([, init]) => init?.method === 'PUT');
    const sizes = puts.map(([, init]) => (JSON.parse(bodyOf(init)) as { results: unknown[] }).results.length);
    expect(sizes).toEqual([150, 150, 20]);
    expect(server.receivedResultIds).toEqual(ids);
    expect(puts[0] && urlOf(puts[0][0])).toBe('/api/inspections/srv-1/results');
  });

  it('retries a batch lost to a network failure and sends nothing twice', async () => {
    const store = openStore(dbName);
    const ids = resultIds(320);
    await saveInspectionWithResults(store, 'insp-a', ids);
    server.failNext('results', { network: true }, { skip: 1 });
    const engine = engineFor(store);

    expect(await engine.syncNow()).toBe('retry');
    expect(engine.getStatus().waiting).toBe(170);
    expect(engine.getStatus().lastError).toBeUndefined();
    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);
    await engine.idle();

    expect(server.receivedResultIds).toHaveLength(320);
    expect(new Set(server.receivedResultIds).size).toBe(320);
  });

  it('resends a batch whose answer was lost and the server still stores each result once', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(40));
    server.failNext('results', { network: true }, { afterHandling: true });
    const engine = engineFor(store);

    await engine.syncNow();
    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);

    expect(server.receivedResultIds).toHaveLength(80);
    expect(server.storedResults.size).toBe(40);
  });

  it('retries after a server fault, a timeout and throttling', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(3));
    server.failNext('create', { status: 503, message: 'Down for maintenance.' });
    server.failNext('results', { status: 408, message: 'Timed out.' });
    server.failNext('results', { status: 429, message: 'Slow down.' });
    // No delay: the retry comes due while the failed run is still settling.
    const engine = engineFor(store, { retryDelayMs: () => 0 });

    await engine.syncNow();
    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);

    expect(server.receivedResultIds).toEqual(resultIds(3));
    expect(engine.getStatus().lastError).toBeUndefined();
  });

  it('keeps a refused create against its inspection while another inspection goes on, and sends it when asked again', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(2, 'a'));
    await saveInspectionWithResults(store, 'insp-b', resultIds(2, 'b'));
    const message = 'Review and sign the last report of unit 418 first.';
    server.failNext('create', { status: 409, message });
    const engine = engineFor(store, { retryDelayMs: () => 60_000 });

    expect(await engine.syncNow()).toBe('done');
    // No retry loop: the conflict waits for the driver; the other inspection is through.
    await new Promise((resolve) => setTimeout(resolve, 40));
    expect(server.createRequests.map((request) => request.clientId)).toEqual(['insp-b']);
    expect(server.receivedResultIds).toEqual(resultIds(2, 'b'));
    const refused = (await store.listRefused()).map(({ kind, clientId, refusal }) => [
      kind,
      clientId,
      refusal.status,
      refusal.message,
    ]);
    expect(refused).toEqual([['inspection', 'insp-a', 409, message]]);
    expect(engine.getStatus().waiting).toBe(3);

    await store.clearRefusals('insp-a');
    expect(await engine.syncNow()).toBe('done');
    expect(engine.getStatus().waiting).toBe(0);
    expect(server.receivedResultIds).toEqual([...resultIds(2, 'b'), ...resultIds(2, 'a')]);
  });

  it('uploads notes and photos after the results, one multipart request each', async () => {
    const store = openStore(dbName);
    await store.saveInspection({ request: createRequest('insp-a'), vehicles: [], checklist });
    await store.saveNote({
      clientId: 'note-1',
      inspectionClientId: 'insp-a',
      itemKey: 'lamps.marker.left',
      audio: new Blob(['opus-bytes'], { type: 'audio/webm;codecs=opus' }),
      durationMs: 3120.4,
      heard: 'cracked lens on the left marker lamp',
    });
    await store.savePhoto({
      clientId: 'photo-1',
      inspectionClientId: 'insp-a',
      itemKey: 'lamps.marker.left',
      image: new Blob(['jpeg-bytes'], { type: 'image/jpeg' }),
    });
    // Written after the note, still sent before it.
    await store.saveResults('insp-a', [result('r-1', 'lamps.marker.left', 'defect')]);
    const engine = engineFor(store);
    await engine.syncNow();

    expect(server.order).toEqual(['create', 'results', 'note', 'photo']);
    expect(server.uploads.note[0]).toMatchObject({
      inspectionId: 'srv-1',
      clientId: 'note-1',
      itemKey: 'lamps.marker.left',
      fields: { heard: 'cracked lens on the left marker lamp', durationMs: '3120' },
      fileName: 'note-1.webm',
      fileType: 'audio/webm;codecs=opus',
      fileText: 'opus-bytes',
    });
    expect(server.uploads.photo[0]).toMatchObject({
      clientId: 'photo-1',
      fileName: 'photo-1.jpg',
      fileText: 'jpeg-bytes',
    });
    const noteCall = vi.mocked(fetch).mock.calls.find(([url]) => urlOf(url).endsWith('/notes'));
    expect(noteCall?.[1]?.headers).toMatchObject({ Authorization: 'Bearer driver-token' });
    expect((await store.getNotes('insp-a'))[0]).toMatchObject({ synced: 1, serverId: 'note-note-1' });
    expect(engine.getStatus().waiting).toBe(0);
  });

  it('keeps a refused result aside and sends the rest of its batch, the note and the other inspections', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(5));
    await saveInspectionWithResults(store, 'insp-b', resultIds(1, 'b'));
    await store.saveNote({
      clientId: 'note-1',
      inspectionClientId: 'insp-a',
      itemKey: 'item.r-1',
      audio: new Blob(['x'], { type: 'audio/ogg' }),
      durationMs: 900,
    });
    const message = 'Item key item.r-3 is not on this checklist.';
    server.failNext('results', { status: 400, message, fields: [{ field: 'results.2.itemKey', message }] });
    const engine = engineFor(store);

    expect(await engine.syncNow()).toBe('done');
    await new Promise((resolve) => setTimeout(resolve, 40));

    expect(server.receivedResultIds).toEqual(['r-1', 'r-2', 'r-4', 'r-5', 'b-1']);
    expect(server.uploads.note.map((note) => note.clientId)).toEqual(['note-1']);
    expect(await store.listRefused()).toEqual([
      expect.objectContaining({ kind: 'result', clientId: 'r-3', inspectionClientId: 'insp-a' }),
    ]);
    expect(engine.getStatus()).toMatchObject({ waiting: 1, syncing: false, lastError: undefined });

    // Not sent again on its own; the driver may leave it out.
    await engine.syncNow();
    expect(server.receivedResultIds).toHaveLength(5);
    await store.discardRefused('result', 'r-3');
    expect(await store.countWaiting()).toBe(0);
  });

  it('refuses a note the server will not take and still uploads the next one', async () => {
    const store = openStore(dbName);
    await store.saveInspection({ request: createRequest('insp-a'), vehicles: [], checklist });
    for (const id of ['note-1', 'note-2']) {
      await store.saveNote({
        clientId: id,
        inspectionClientId: 'insp-a',
        itemKey: 'item.r-1',
        audio: new Blob([id], { type: 'audio/ogg' }),
        durationMs: 900,
      });
    }
    server.failNext('note', { status: 413, message: 'This voice note is too large.' });
    const engine = engineFor(store);

    expect(await engine.syncNow()).toBe('done');
    expect(server.uploads.note.map((note) => note.clientId)).toEqual(['note-2']);
    expect((await store.listRefused()).map((entry) => [entry.kind, entry.clientId, entry.refusal.status])).toEqual([
      ['note', 'note-1', 413],
    ]);
  });

  it('sends a report signed offline after its answers, once, and frees the sent audio and photos', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(2));
    await store.saveNote({
      clientId: 'note-1',
      inspectionClientId: 'insp-a',
      itemKey: 'item.r-1',
      audio: new Blob(['opus-bytes'], { type: 'audio/webm' }),
      durationMs: 1200,
    });
    await store.savePhoto({
      clientId: 'photo-1',
      inspectionClientId: 'insp-a',
      itemKey: 'item.r-1',
      image: new Blob(['jpeg-bytes'], { type: 'image/jpeg' }),
    });
    // Sent while the run is open: the bytes stay for replay.
    const engine = engineFor(store);
    await engine.syncNow();
    expect((await store.getNotes('insp-a'))[0]?.bytes.byteLength).toBe(10);

    online = false;
    await store.signInspection('insp-a', {
      signature: { name: 'Tomas Reyes' },
      signedAt: '2026-12-01T06:10:00.000Z',
    });
    expect(await engine.syncNow()).toBe('offline');
    expect(engine.getStatus().waiting).toBe(1);

    online = true;
    expect(await engine.syncNow()).toBe('done');
    expect(server.submitted.get('srv-1')).toMatchObject({
      signature: { name: 'Tomas Reyes' },
      signedAt: '2026-12-01T06:10:00.000Z',
    });
    const inspection = await store.getInspection('insp-a');
    expect(inspection?.submittedAt).toBe('2026-12-01T09:00:00.000Z');
    expect((await store.getNotes('insp-a'))[0]).toMatchObject({ synced: 1, freed: 1 });
    expect((await store.getNotes('insp-a'))[0]?.bytes.byteLength).toBe(0);
    expect((await store.getPhotos('insp-a'))[0]?.bytes.byteLength).toBe(0);
    expect(engine.getStatus().waiting).toBe(0);
  });

  it('takes a 409 on a submit whose answer was lost as done once the server shows the report submitted', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(1));
    await store.signInspection('insp-a', { signature: { name: 'Tomas Reyes' } });
    // The server submits the report, then the answer is lost: the resend meets a 409.
    server.failNext('submit', { network: true }, { afterHandling: true });
    const engine = engineFor(store, { retryDelayMs: () => 0 });

    expect(await engine.syncNow()).toBe('retry');
    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);

    expect(server.order.filter((route) => route === 'submit')).toHaveLength(2);
    expect(server.order.at(-1)).toBe('get');
    expect(server.submitted.size).toBe(1);
    expect(await store.listRefused()).toEqual([]);
    expect((await store.getInspection('insp-a'))?.submittedAt).toBe('2026-12-01T09:00:00.000Z');
  });

  it('does not retry results forever on a 409 for an inspection submitted elsewhere', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(1));
    await saveInspectionWithResults(store, 'insp-b', resultIds(1, 'b'));
    server.failNext('results', { status: 409, message: 'This report is submitted and signed.' });
    const engine = engineFor(store, { retryDelayMs: () => 0 });

    expect(await engine.syncNow()).toBe('done');
    await new Promise((resolve) => setTimeout(resolve, 40));

    const resultCalls = vi.mocked(fetch).mock.calls.filter(([url]) => urlOf(url).endsWith('/results'));
    expect(resultCalls).toHaveLength(2);
    expect(server.receivedResultIds).toEqual(['b-1']);
    expect((await store.listRefused()).map((entry) => entry.clientId)).toEqual(['r-1']);
  });

  it('stops on a lost session without clearing the token or leaving the walk-around', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(1));
    server.failNext('create', { status: 401, message: 'Your session has expired.' });
    const engine = engineFor(store);

    expect(await engine.syncNow()).toBe('stopped');
    expect(engine.getStatus().lastError).toBe('Your session has expired.');
    expect(tokenStore.get()).toBe('driver-token');
  });

  it('never has the same result in two requests at once and resends one changed mid-flight', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(10));
    const release = server.holdNext('results');
    const engine = engineFor(store);

    const first = engine.syncNow();
    await vi.waitFor(() => expect(server.maxInFlight).toBe(1), WAIT);
    await vi.waitFor(
      () => expect(vi.mocked(fetch).mock.calls.some(([, init]) => init?.method === 'PUT')).toBe(true),
      WAIT,
    );
    expect(engine.getStatus().syncing).toBe(true);
    // The driver corrects r-1 while its first answer is on the way.
    await store.saveResults('insp-a', [{ ...result('r-1', 'item.r-1', 'defect'), detail: 'cracked' }]);
    const again = [engine.syncNow(), engine.syncNow(), engine.syncNow()];
    release();
    await Promise.all([first, ...again]);
    await engine.idle();

    expect(server.maxInFlight).toBe(1);
    expect(server.receivedResultIds.filter((id) => id === 'r-1')).toHaveLength(2);
    expect(server.receivedResultIds.filter((id) => id !== 'r-1').sort()).toEqual(resultIds(10).slice(1).sort());
    expect(server.storedResults.get('r-1')).toMatchObject({ answer: 'defect', detail: 'cracked' });
    expect(engine.getStatus().waiting).toBe(0);
  });

  it('lets only one tab send at a time when two tabs share the outbox', async () => {
    // A stand-in for Web Locks: each request waits for the one before it.
    let tail: Promise<unknown> = Promise.resolve();
    const locks = {
      request: <T>(_name: string, callback: () => Promise<T>): Promise<T> => {
        const next = tail.then(callback);
        tail = next.catch(() => undefined);
        return next;
      },
    } as unknown as Pick<LockManager, 'request'>;
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(30));
    const tabA = engineFor(store, { locks });
    const tabB = engineFor(openStore(dbName), { locks });

    await Promise.all([tabA.syncNow(), tabB.syncNow()]);

    expect(server.maxInFlight).toBe(1);
    expect(server.createRequests).toHaveLength(1);
    expect(server.receivedResultIds).toEqual(resultIds(30));
  });

  it('gathers a burst of local writes into one request after the debounce', async () => {
    const store = openStore(dbName);
    const engine = engineFor(store, { debounceMs: 1000 });
    await engine.start();
    await store.saveInspection({ request: createRequest('insp-a'), vehicles: [], checklist });
    for (const id of resultIds(4)) await store.saveResults('insp-a', [result(id, `item.${id}`)]);
    expect(engine.getStatus().waiting).toBeGreaterThan(0);

    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);
    await engine.idle();
    expect(server.order).toEqual(['create', 'results']);
  });

  it('syncs when the app comes back to the screen', async () => {
    const store = openStore(dbName);
    online = false;
    const engine = engineFor(store);
    await engine.start();
    await saveInspectionWithResults(store, 'insp-a', resultIds(2));
    online = true;
    Object.defineProperty(document, 'visibilityState', { value: 'visible', configurable: true });
    document.dispatchEvent(new Event('visibilitychange'));
    await engine.idle();
    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);
    expect(server.receivedResultIds).toEqual(resultIds(2));
  });

  it('does not call the server while the device says it is offline', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(2));
    online = false;
    const engine = engineFor(store);
    expect(await engine.syncNow()).toBe('offline');
    expect(fetch).not.toHaveBeenCalled();
    expect(engine.getStatus().waiting).toBe(3);
  });

  it('reports whether persistent storage was granted', async () => {
    const { resetPersistentStorageRequest } = await import('./persistent-storage');
    resetPersistentStorageRequest();
    const storage = { persist: vi.fn(() => Promise.resolve(true)), persisted: vi.fn(() => Promise.resolve(false)) };
    const engine = engineFor(openStore(dbName), { storage: storage as unknown as StorageManager });
    await engine.start();
    await vi.waitFor(() => expect(engine.getStatus().storagePersisted).toBe('granted'), WAIT);
    resetPersistentStorageRequest();
  });
});

describe('isRetryable', () => {
  it.each([
    [0, true],
    [500, true],
    [503, true],
    [408, true],
    [409, false],
    [429, true],
    [400, false],
    [401, false],
    [403, false],
    [404, false],
    [413, false],
    [422, false],
  ])('status %i is retried: %s', (status, expected) => {
    expect(isRetryable(new ApiError(status, 'x'))).toBe(expected);
  });

  it('does not retry an error of the device itself', () => {
    expect(isRetryable(new Error('QuotaExceededError'))).toBe(false);
  });
});
