import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Checklist, CreateInspectionRequest, ResultUpsert } from '@yardcall/shared';
import { ApiError, tokenStore } from '../api-client';
import { createFakeSyncServer } from './fake-sync-server';
import { openOfflineDb, type OfflineDb } from './offline-db';
import { createOfflineStore, type OfflineStore } from './offline-store';
import { createSyncEngine, isRetryable, type SyncEngine, type SyncEngineOptions } from './sync-engine';

const checklist: Checklist = { kind: 'pre_trip', locale: 'en', zones: [], items: [] };

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

  it('retries after a server fault, a timeout, throttling and a conflict', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(3));
    server.failNext('create', { status: 503, message: 'Down for maintenance.' });
    server.failNext('results', { status: 408, message: 'Timed out.' });
    server.failNext('results', { status: 429, message: 'Slow down.' });
    server.failNext('results', { status: 409, message: 'Busy with the same result.' });
    // No delay: the retry comes due while the failed run is still settling.
    const engine = engineFor(store, { retryDelayMs: () => 0 });

    await engine.syncNow();
    await vi.waitFor(() => expect(engine.getStatus().waiting).toBe(0), WAIT);

    expect(server.receivedResultIds).toEqual(resultIds(3));
    expect(engine.getStatus().lastError).toBeUndefined();
  });

  it('shows the sentence of a conflict while it keeps retrying, and clears it once through', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(2));
    const message = 'Review and sign the last report of unit 418 first.';
    server.failNext('create', { status: 409, message });
    const engine = engineFor(store, { retryDelayMs: () => 60_000 });

    expect(await engine.syncNow()).toBe('retry');
    expect(engine.getStatus()).toMatchObject({ lastError: message, waiting: 3 });

    expect(await engine.syncNow()).toBe('done');
    expect(engine.getStatus()).toMatchObject({ lastError: undefined, waiting: 0 });
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

  it('stops on a refused batch with the server sentence and keeps the rest queued', async () => {
    const store = openStore(dbName);
    await saveInspectionWithResults(store, 'insp-a', resultIds(5));
    await store.saveNote({
      clientId: 'note-1',
      inspectionClientId: 'insp-a',
      itemKey: 'item.r-1',
      audio: new Blob(['x'], { type: 'audio/ogg' }),
      durationMs: 900,
    });
    server.failNext('results', { status: 400, message: 'Item key item.r-3 is not on this checklist.' });
    const engine = engineFor(store);

    expect(await engine.syncNow()).toBe('stopped');
    await new Promise((resolve) => setTimeout(resolve, 40));

    expect(engine.getStatus()).toMatchObject({
      lastError: 'Item key item.r-3 is not on this checklist.',
      waiting: 6,
      syncing: false,
    });
    // No retry loop and no note sent past the refusal.
    expect(server.order).toEqual(['create']);
    expect(server.receivedResultIds).toEqual([]);

    // The next trigger tries again; a clean run clears the sentence.
    await engine.syncNow();
    expect(engine.getStatus()).toMatchObject({ waiting: 0, lastError: undefined });
    expect(server.order).toEqual(['create', 'results', 'note']);
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
    [409, true],
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
