import type { InspectionResponse, ResultUpsert, SubmitInspectionRequest } from '@yardcall/shared';
import { ApiError, NETWORK_ERROR_STATUS } from '../api-client';
import { describeError } from '../errors';
import type { LocalNote, LocalPhoto, OutboxKind } from './records';
import type { OfflineStore, PendingResult } from './offline-store';
import { requestPersistentStorage, type PersistOutcome } from './persistent-storage';
import { apiSyncTransport, type SyncTransport } from './sync-transport';

export interface SyncStatus {
  // Creates, results, notes and photos not yet acknowledged by the server.
  waiting: number;
  syncing: boolean;
  // A sentence for the driver when the server refused something; cleared by the next clean run.
  lastError?: string;
  lastSyncedAt?: string;
  storagePersisted?: PersistOutcome;
}

// The server takes at most this many results in one PUT.
export const MAX_RESULTS_PER_PUT = 150;
// Our own practice: long enough to gather a burst of answers, short enough to feel immediate.
export const SYNC_DEBOUNCE_MS = 1000;

// Our own practice: 1 s doubling to 1 min, with jitter so many phones do not retry together.
export function defaultRetryDelayMs(attempt: number): number {
  const capped = Math.min(60_000, 1000 * 2 ** attempt);
  return Math.round(capped * (0.5 + Math.random() / 2));
}

export interface SyncEngineOptions {
  store: OfflineStore;
  transport?: SyncTransport;
  batchSize?: number;
  debounceMs?: number;
  retryDelayMs?: (attempt: number) => number;
  isOnline?: () => boolean;
  // Where `online` and `visibilitychange` are heard.
  events?: { window: Window; document: Document };
  storage?: StorageManager;
  // Shared by the tabs of one origin; absent where the browser has no Web Locks.
  locks?: Pick<LockManager, 'request'>;
  now?: () => Date;
}

export const SYNC_LOCK_NAME = 'yardcall-offline-sync';

export type SyncEngine = ReturnType<typeof createSyncEngine>;

type RunOutcome = 'done' | 'offline' | 'retry' | 'stopped';

// Retried with backoff: no answer, a server fault, a timeout or throttling. A conflict is not: the
// server's state (a submitted report, a review to sign first) does not change by asking again.
export function isRetryable(error: unknown): boolean {
  if (!(error instanceof ApiError)) return false;
  const { status } = error;
  return status === NETWORK_ERROR_STATUS || status >= 500 || status === 408 || status === 429;
}

// A lost session stops the whole run (every request would fail the same way) until the driver signs in.
function stopsEveryRecord(error: unknown): boolean {
  return error instanceof ApiError && (error.status === 401 || error.status === 403);
}

// Refusals the server names per result of a batch ("results.3.itemKey"): those results alone.
function refusedIndexes(error: ApiError, batchLength: number): Set<number> {
  const indexes = new Set<number>();
  for (const field of error.fields) {
    const match = /^results\.(\d+)\./.exec(field.field);
    const index = match ? Number(match[1]) : -1;
    if (index >= 0 && index < batchLength) indexes.add(index);
  }
  return indexes;
}

function fileExtension(mimeType: string): string {
  const base = mimeType.split(';')[0]?.trim() ?? '';
  const known: Record<string, string> = {
    'audio/webm': 'webm',
    'audio/ogg': 'ogg',
    'audio/mp4': 'm4a',
    'audio/mpeg': 'mp3',
    'audio/wav': 'wav',
    'image/jpeg': 'jpg',
    'image/png': 'png',
    'image/webp': 'webp',
  };
  return known[base] ?? 'bin';
}

// The upload of a note or a photo: the file first, then its item, any fields of its own, and its client id.
function uploadForm(row: LocalNote | LocalPhoto, fields: Record<string, string | undefined> = {}): FormData {
  const form = new FormData();
  form.append('file', new Blob([row.bytes], { type: row.mimeType }), `${row.clientId}.${fileExtension(row.mimeType)}`);
  form.append('itemKey', row.itemKey);
  for (const [name, value] of Object.entries(fields)) if (value !== undefined) form.append(name, value);
  form.append('clientId', row.clientId);
  return form;
}

function noteForm(note: LocalNote): FormData {
  return uploadForm(note, { heard: note.heard, durationMs: String(Math.round(note.durationMs)) });
}

// Sends what the offline store holds, oldest first: creates, then results in batches, then notes
// and photos one upload each. Everything sent carries its client id, so a resend is harmless.
export function createSyncEngine(options: SyncEngineOptions) {
  const { store } = options;
  const transport = options.transport ?? apiSyncTransport;
  const batchSize = Math.min(options.batchSize ?? MAX_RESULTS_PER_PUT, MAX_RESULTS_PER_PUT);
  const debounceMs = options.debounceMs ?? SYNC_DEBOUNCE_MS;
  const retryDelayMs = options.retryDelayMs ?? defaultRetryDelayMs;
  const isOnline = options.isOnline ?? (() => globalThis.navigator?.onLine !== false);
  const now = options.now ?? (() => new Date());
  const locks = 'locks' in options ? options.locks : globalThis.navigator?.locks;

  let status: SyncStatus = { waiting: 0, syncing: false };
  const listeners = new Set<(status: SyncStatus) => void>();
  let running: Promise<RunOutcome> | null = null;
  let runAgain = false;
  let attempt = 0;
  let retryTimer: ReturnType<typeof setTimeout> | undefined;
  let debounceTimer: ReturnType<typeof setTimeout> | undefined;
  let detach: (() => void) | null = null;
  let stopped = false;

  function setStatus(patch: Partial<SyncStatus>): void {
    status = { ...status, ...patch };
    for (const listener of listeners) listener(status);
  }

  async function refreshWaiting(): Promise<void> {
    setStatus({ waiting: await store.countWaiting() });
  }

  function refreshWaitingSoon(): void {
    // A failed count only leaves the figure stale until the next run.
    refreshWaiting().catch(() => undefined);
  }

  async function acknowledged(): Promise<void> {
    setStatus({ lastSyncedAt: now().toISOString(), waiting: await store.countWaiting() });
  }

  // A refusal that sending again cannot fix is kept against its record and the run goes on with
  // the others; anything retryable or a lost session ends the run.
  async function settle(kind: OutboxKind, clientId: string, work: () => Promise<void>): Promise<boolean> {
    try {
      await work();
      return true;
    } catch (error) {
      if (isRetryable(error) || stopsEveryRecord(error) || !(error instanceof ApiError)) throw error;
      await store.refuse(kind, clientId, {
        status: error.status,
        message: describeError(error),
        at: now().toISOString(),
      });
      return false;
    }
  }

  async function pushCreates(): Promise<void> {
    for (const inspection of await store.pendingCreates()) {
      await settle('inspection', inspection.clientId, async () => {
        const created = await transport.createInspection(inspection.request);
        await store.markInspectionCreated(inspection.clientId, created.id);
        await acknowledged();
      });
    }
  }

  async function sendBatch(serverId: string, batch: PendingResult[]): Promise<void> {
    let rest = batch;
    while (rest.length > 0) {
      try {
        const upserts: ResultUpsert[] = rest.map((result) => result.upsert);
        await transport.putResults(serverId, { results: upserts });
        await store.markResultsSynced(rest.map(({ upsert, revision }) => ({ clientId: upsert.clientId, revision })));
        await acknowledged();
        return;
      } catch (error) {
        if (isRetryable(error) || stopsEveryRecord(error) || !(error instanceof ApiError)) throw error;
        // The results the server named are kept aside and the others go again; unnamed, all of them.
        const named = refusedIndexes(error, rest.length);
        const refused = named.size > 0 ? rest.filter((_, index) => named.has(index)) : rest;
        const refusal = { status: error.status, message: describeError(error), at: now().toISOString() };
        for (const result of refused) await store.refuse('result', result.upsert.clientId, refusal);
        rest = named.size > 0 ? rest.filter((_, index) => !named.has(index)) : [];
      }
    }
  }

  async function pushResults(): Promise<void> {
    const pending = await store.pendingResults();
    const byInspection = new Map<string, PendingResult[]>();
    for (const result of pending) {
      const list = byInspection.get(result.inspectionClientId) ?? [];
      list.push(result);
      byInspection.set(result.inspectionClientId, list);
    }
    for (const [inspectionClientId, results] of byInspection) {
      // Its create is refused or not through yet: the other inspections go on.
      const serverId = await store.serverIdOf(inspectionClientId);
      if (!serverId) continue;
      for (let start = 0; start < results.length; start += batchSize) {
        await sendBatch(serverId, results.slice(start, start + batchSize));
      }
    }
  }

  const uploadNote = (serverId: string, note: LocalNote) => transport.uploadNote(serverId, noteForm(note));
  const uploadPhoto = (serverId: string, photo: LocalPhoto) => transport.uploadPhoto(serverId, uploadForm(photo));

  // Notes and photos, one upload each; one waits while its inspection's create is not through.
  async function pushFiles<Row extends LocalNote | LocalPhoto>(
    kind: 'note' | 'photo',
    pending: Row[],
    upload: (serverId: string, row: Row) => Promise<{ id: string }>,
    markSynced: (clientId: string, serverId: string) => Promise<void>,
  ): Promise<void> {
    for (const row of pending) {
      const serverId = await store.serverIdOf(row.inspectionClientId);
      if (!serverId) continue;
      await settle(kind, row.clientId, async () => {
        const saved = await upload(serverId, row);
        await markSynced(row.clientId, saved.id);
        await acknowledged();
      });
    }
  }

  // The store's settle functions are arrow properties: they need no `this`.
  const pushNotes = async () => pushFiles('note', await store.pendingNotes(), uploadNote, store.markNoteSynced);
  const pushPhotos = async () => pushFiles('photo', await store.pendingPhotos(), uploadPhoto, store.markPhotoSynced);

  // A 409 on a submit whose answer was lost: the server already holds this report. Confirmed by
  // reading it back, so a report submitted from elsewhere is not taken for ours silently.
  async function submitOnce(
    serverId: string,
    request: SubmitInspectionRequest,
  ): Promise<Pick<InspectionResponse, 'submittedAt'>> {
    try {
      return await transport.submitInspection(serverId, request);
    } catch (error) {
      if (!(error instanceof ApiError) || error.status !== 409) throw error;
      const stored = await transport.getInspection(serverId);
      if (stored.status !== 'submitted') throw error;
      return stored;
    }
  }

  async function pushSubmits(): Promise<void> {
    for (const inspection of await store.pendingSubmits()) {
      const serverId = inspection.serverId ?? (await store.serverIdOf(inspection.clientId));
      if (!serverId || !inspection.signed) continue;
      // The report is signed over every answer, note and photo: it goes once they all have.
      const waiting = await store.waitingOf(inspection.clientId);
      if (waiting.some((entry) => entry.kind !== 'submit')) continue;
      const { request } = inspection.signed;
      await settle('submit', inspection.clientId, async () => {
        const submitted = await submitOnce(serverId, request);
        await store.markSubmitted(inspection.clientId, submitted.submittedAt ?? now().toISOString());
        await acknowledged();
      });
    }
  }

  function scheduleRetry(): void {
    if (stopped) return;
    clearTimeout(retryTimer);
    const delay = retryDelayMs(attempt);
    attempt += 1;
    retryTimer = setTimeout(() => void syncNow(), delay);
  }

  async function runOnce(): Promise<RunOutcome> {
    if (!isOnline()) {
      await refreshWaiting();
      return 'offline';
    }
    setStatus({ syncing: true });
    try {
      await pushCreates();
      await pushResults();
      await pushNotes();
      await pushPhotos();
      await pushSubmits();
      attempt = 0;
      clearTimeout(retryTimer);
      setStatus({ lastError: undefined });
      return 'done';
    } catch (error) {
      if (isRetryable(error)) return 'retry';
      setStatus({ lastError: describeError(error) });
      return 'stopped';
    } finally {
      setStatus({ syncing: false, waiting: await store.countWaiting() });
    }
  }

  // One run at a time: a request during a run is folded into one more run after it, so the same
  // result is never in two requests at once.
  function syncNow(): Promise<RunOutcome> {
    if (running) {
      runAgain = true;
      return running;
    }
    running = (async () => {
      let outcome: RunOutcome;
      do {
        runAgain = false;
        // Two tabs on the same device must not send the same outbox at once either.
        outcome = locks ? await locks.request(SYNC_LOCK_NAME, runOnce) : await runOnce();
      } while (runAgain && outcome === 'done');
      // Scheduled once the run is over, so the retry cannot be folded into the run that failed.
      if (outcome === 'retry') scheduleRetry();
      return outcome;
    })().finally(() => {
      running = null;
    });
    return running;
  }

  function scheduleSoon(): void {
    clearTimeout(debounceTimer);
    debounceTimer = setTimeout(() => void syncNow(), debounceMs);
  }

  return {
    syncNow,

    getStatus: (): SyncStatus => status,

    subscribe(listener: (status: SyncStatus) => void): () => void {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },

    // Listens for a reconnect and for the app coming back to the screen, asks for persistent
    // storage once, and sends what an earlier session left.
    start(): Promise<RunOutcome> {
      stopped = false;
      if (!detach) {
        const target = options.events ?? { window: globalThis.window, document: globalThis.document };
        const onOnline = () => {
          attempt = 0;
          void syncNow();
        };
        const onVisibility = () => {
          if (target.document.visibilityState === 'visible') void syncNow();
        };
        target.window.addEventListener('online', onOnline);
        target.document.addEventListener('visibilitychange', onVisibility);
        const unsubscribeStore = store.onWrite(() => {
          refreshWaitingSoon();
          scheduleSoon();
        });
        detach = () => {
          target.window.removeEventListener('online', onOnline);
          target.document.removeEventListener('visibilitychange', onVisibility);
          unsubscribeStore();
        };
        void requestPersistentStorage(options.storage).then((outcome) => setStatus({ storagePersisted: outcome }));
      }
      return syncNow();
    },

    // Stops listening and cancels pending timers; a run already under way finishes.
    stop(): void {
      stopped = true;
      detach?.();
      detach = null;
      clearTimeout(retryTimer);
      clearTimeout(debounceTimer);
    },

    // Resolves when no run is under way (for tests and for a clean shutdown).
    async idle(): Promise<void> {
      while (running) await running;
    },
  };
}
