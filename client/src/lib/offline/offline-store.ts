import type { IDBPTransaction } from 'idb';
import type { ResultUpsert, SubmitInspectionRequest } from '@yardcall/shared';
import type { OfflineDb, OfflineSchema, OfflineStoreName } from './offline-db';
import type {
  CachedEntry,
  JsonValue,
  LocalInspection,
  LocalNote,
  LocalPhoto,
  LocalResult,
  OutboxEntry,
  OutboxKind,
  Refusal,
} from './records';

// serverId is known when the inspection was created online; then nothing waits to be sent.
export type NewInspection = Pick<
  LocalInspection,
  'request' | 'vehicles' | 'checklist' | 'spokenChecklists' | 'voiceState' | 'serverId'
> &
  Partial<Pick<LocalInspection, 'requiredReadings'>>;

// Thrown for a write to a walk-around that is signed: the phone keeps it as it was signed.
export class SignedInspectionError extends Error {
  constructor(readonly inspectionClientId: string) {
    super('This walk-around is signed: it can no longer be changed on this phone.');
    this.name = 'SignedInspectionError';
  }
}

// An outbox entry the server refused, with what it was about, for the driver to see.
export interface RefusedEntry {
  kind: OutboxKind;
  clientId: string;
  inspectionClientId: string;
  refusal: Refusal;
}

// The row's fields as given by the caller: a Blob instead of bytes, and a type that defaults to the Blob's own.
type Given<Row extends LocalNote | LocalPhoto> = Pick<Row, 'clientId' | 'inspectionClientId' | 'itemKey'> & {
  mimeType?: string;
};

export type NewNote = Given<LocalNote> & Pick<LocalNote, 'durationMs' | 'heard'> & { audio: Blob };

export type NewPhoto = Given<LocalPhoto> & { image: Blob };

export type PendingResult = Pick<LocalResult, 'inspectionClientId' | 'upsert' | 'revision'>;

// A walk-around as the glove screen resumes it: the inspection and every answer saved so far.
export interface LocalWalkaround {
  inspection: LocalInspection;
  results: LocalResult[];
}

export interface ResultAck {
  clientId: string;
  revision: number;
}

type WriteListener = () => void;

type WriteTransaction = IDBPTransaction<OfflineSchema, OfflineStoreName[], 'readwrite'>;

export type OfflineStore = ReturnType<typeof createOfflineStore>;

function present<T>(row: T | undefined): row is T {
  return row !== undefined;
}

// Records written before version 2 of the store have no required readings.
function withDefaults(inspection: LocalInspection): LocalInspection {
  return { ...inspection, requiredReadings: inspection.requiredReadings ?? [] };
}

const NO_BYTES = new ArrayBuffer(0);

// Every answer, note and photo lands here first; the sync engine sends what the outbox lists.
export function createOfflineStore(db: OfflineDb, now: () => Date = () => new Date()) {
  const listeners = new Set<WriteListener>();
  const notifyWrite = () => {
    for (const listener of listeners) listener();
  };

  // One read-write transaction over the named stores; only IndexedDB requests may be awaited
  // inside it, or it commits early.
  async function write<T>(names: OfflineStoreName[], work: (tx: WriteTransaction) => Promise<T>): Promise<T> {
    const tx = (await db.connection()).transaction(names, 'readwrite');
    const [result] = await Promise.all([work(tx), tx.done]);
    return result;
  }

  async function enqueue(
    tx: WriteTransaction,
    kind: OutboxKind,
    clientId: string,
    inspectionClientId: string,
  ): Promise<void> {
    // Unique on kind+clientId: a second write of something still waiting keeps its first place.
    const outbox = tx.objectStore('outbox');
    const existing = await outbox.index('kindClientId').getKey([kind, clientId]);
    if (existing === undefined) await outbox.add({ kind, clientId, inspectionClientId });
  }

  async function dequeue(tx: WriteTransaction, kind: OutboxKind, clientId: string): Promise<void> {
    const outbox = tx.objectStore('outbox');
    const seq = await outbox.index('kindClientId').getKey([kind, clientId]);
    if (seq !== undefined) await outbox.delete(seq);
  }

  async function requireInspection(tx: WriteTransaction, clientId: string): Promise<LocalInspection> {
    const inspection = await tx.objectStore('inspections').get(clientId);
    if (!inspection) throw new Error(`No inspection ${clientId} is stored on this device.`);
    return inspection;
  }

  // A signed walk-around is read-only: nothing more is added to what the driver signed.
  async function requireOpen(tx: WriteTransaction, clientId: string): Promise<LocalInspection> {
    const inspection = await requireInspection(tx, clientId);
    if (inspection.signed) throw new SignedInspectionError(clientId);
    return inspection;
  }

  // A photo's row, and the part of a note's it shares: the Blob's bytes (see LocalNote), its type unless given.
  async function fileRow(input: Given<LocalNote | LocalPhoto>, blob: Blob): Promise<LocalPhoto> {
    return {
      clientId: input.clientId,
      inspectionClientId: input.inspectionClientId,
      itemKey: input.itemKey,
      bytes: await blob.arrayBuffer(),
      mimeType: input.mimeType ?? blob.type,
      synced: 0,
      createdAt: now().toISOString(),
    };
  }

  // Kept and queued to send, unless the server already has it (a resend after an acknowledgement).
  async function keepFile<Name extends 'notes' | 'photos'>(
    name: Name,
    kind: 'note' | 'photo',
    row: OfflineSchema[Name]['value'],
  ): Promise<void> {
    await write(['inspections', name, 'outbox'], async (tx) => {
      await requireOpen(tx, row.inspectionClientId);
      const files = tx.objectStore(name);
      if ((await files.get(row.clientId))?.synced === 1) return;
      await files.put(row);
      await enqueue(tx, kind, row.clientId, row.inspectionClientId);
    });
    notifyWrite();
  }

  // Outbox entries of a kind in the order they were written (the index keeps the key order); a
  // refused entry is left for the driver and never sent again on its own.
  async function pendingOf<Name extends 'inspections' | 'results' | 'notes' | 'photos'>(kind: OutboxKind, name: Name) {
    const connection = await db.connection();
    const tx = connection.transaction(['outbox', name], 'readonly');
    const entries: OutboxEntry[] = await tx.objectStore('outbox').index('kind').getAll(kind);
    const rows = await Promise.all(
      entries.filter((entry) => !entry.refusal).map((entry) => tx.objectStore(name).get(entry.clientId)),
    );
    await tx.done;
    return rows.filter(present);
  }

  // Audio and photo bytes the server has, once the run is closed (signed): kept for replay before.
  async function freeSentMedia(tx: WriteTransaction, inspectionClientId: string): Promise<void> {
    for (const name of ['notes', 'photos'] as const) {
      const store = tx.objectStore(name);
      const rows = await store.index('inspectionClientId').getAll(inspectionClientId);
      for (const row of rows) {
        if (row.synced === 1 && row.freed !== 1) await store.put({ ...row, bytes: NO_BYTES, freed: 1 });
      }
    }
  }

  async function markSynced(
    name: 'inspections' | 'notes' | 'photos',
    kind: OutboxKind,
    clientId: string,
    serverId: string,
  ): Promise<void> {
    await write(name === 'inspections' ? ['inspections', 'outbox'] : ['inspections', name, 'outbox'], async (tx) => {
      const store = tx.objectStore(name);
      const row = await store.get(clientId);
      if (row) await store.put({ ...row, serverId, synced: 1 });
      await dequeue(tx, kind, clientId);
      if (row && name !== 'inspections' && 'inspectionClientId' in row) {
        const inspection = await tx.objectStore('inspections').get(row.inspectionClientId);
        if (inspection?.signed) await freeSentMedia(tx, row.inspectionClientId);
      }
    });
  }

  return {
    db,

    onWrite(listener: WriteListener): () => void {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },

    async saveInspection(input: NewInspection): Promise<LocalInspection> {
      const stamp = now().toISOString();
      const inspection: LocalInspection = {
        clientId: input.request.clientId,
        serverId: input.serverId,
        vehicles: input.vehicles,
        kind: input.request.kind,
        request: input.request,
        checklist: input.checklist,
        spokenChecklists: input.spokenChecklists,
        voiceState: input.voiceState,
        requiredReadings: input.requiredReadings ?? [],
        synced: input.serverId ? 1 : 0,
        createdAt: stamp,
        updatedAt: stamp,
      };
      await write(['inspections', 'outbox'], async (tx) => {
        const existing = await tx.objectStore('inspections').get(inspection.clientId);
        // Saving again never forgets a server id already learnt.
        if (existing?.serverId) {
          inspection.serverId = existing.serverId;
          inspection.synced = 1;
        }
        if (existing?.signed) throw new SignedInspectionError(inspection.clientId);
        if (existing) inspection.createdAt = existing.createdAt;
        await tx.objectStore('inspections').put(inspection);
        if (!inspection.serverId) await enqueue(tx, 'inspection', inspection.clientId, inspection.clientId);
      });
      notifyWrite();
      return inspection;
    },

    // Local only: the voice loop's resume point is never sent.
    async saveVoiceState(inspectionClientId: string, voiceState: JsonValue): Promise<void> {
      await write(['inspections'], async (tx) => {
        const inspection = await requireOpen(tx, inspectionClientId);
        await tx.objectStore('inspections').put({ ...inspection, voiceState, updatedAt: now().toISOString() });
      });
    },

    async getInspection(clientId: string): Promise<LocalInspection | undefined> {
      const row = await (await db.connection()).get('inspections', clientId);
      return row && withDefaults(row);
    },

    async listInspections(): Promise<LocalInspection[]> {
      return (await (await db.connection()).getAll('inspections')).map(withDefaults);
    },

    async saveResults(inspectionClientId: string, upserts: ResultUpsert[]): Promise<void> {
      const stamp = now().toISOString();
      await write(['inspections', 'results', 'outbox'], async (tx) => {
        await requireOpen(tx, inspectionClientId);
        for (const upsert of upserts) {
          const existing = await tx.objectStore('results').get(upsert.clientId);
          if (existing && existing.inspectionClientId !== inspectionClientId) {
            throw new Error(`Result ${upsert.clientId} belongs to another inspection.`);
          }
          await tx.objectStore('results').put({
            clientId: upsert.clientId,
            inspectionClientId,
            itemKey: upsert.itemKey,
            upsert,
            synced: 0,
            revision: (existing?.revision ?? 0) + 1,
            updatedAt: stamp,
          });
          await enqueue(tx, 'result', upsert.clientId, inspectionClientId);
        }
      });
      notifyWrite();
    },

    async getResults(inspectionClientId: string): Promise<LocalResult[]> {
      return (await db.connection()).getAllFromIndex('results', 'inspectionClientId', inspectionClientId);
    },

    async getWalkaround(clientId: string): Promise<LocalWalkaround | null> {
      const connection = await db.connection();
      const inspection = await connection.get('inspections', clientId);
      if (!inspection) return null;
      return {
        inspection: withDefaults(inspection),
        results: await connection.getAllFromIndex('results', 'inspectionClientId', clientId),
      };
    },

    async saveNote(input: NewNote): Promise<void> {
      const note: LocalNote = {
        ...(await fileRow(input, input.audio)),
        durationMs: input.durationMs,
        heard: input.heard,
      };
      await keepFile('notes', 'note', note);
    },

    async getNotes(inspectionClientId: string): Promise<LocalNote[]> {
      return (await db.connection()).getAllFromIndex('notes', 'inspectionClientId', inspectionClientId);
    },

    async savePhoto(input: NewPhoto): Promise<void> {
      await keepFile('photos', 'photo', await fileRow(input, input.image));
    },

    async getPhotos(inspectionClientId: string): Promise<LocalPhoto[]> {
      return (await db.connection()).getAllFromIndex('photos', 'inspectionClientId', inspectionClientId);
    },

    async countWaiting(): Promise<number> {
      return (await db.connection()).count('outbox');
    },

    async countWaitingFor(inspectionClientId: string): Promise<number> {
      return (await db.connection()).countFromIndex('outbox', 'inspectionClientId', inspectionClientId);
    },

    // What the sync engine reads and settles.

    pendingCreates: (): Promise<LocalInspection[]> => pendingOf('inspection', 'inspections'),

    markInspectionCreated: (clientId: string, serverId: string): Promise<void> =>
      markSynced('inspections', 'inspection', clientId, serverId),

    async pendingResults(): Promise<PendingResult[]> {
      const rows = await pendingOf('result', 'results');
      return rows.map((row) => ({
        inspectionClientId: row.inspectionClientId,
        upsert: row.upsert,
        revision: row.revision,
      }));
    },

    // Settles only the revisions the server saw; a result changed meanwhile stays queued.
    async markResultsSynced(acks: ResultAck[]): Promise<void> {
      await write(['results', 'outbox'], async (tx) => {
        for (const ack of acks) {
          const row = await tx.objectStore('results').get(ack.clientId);
          if (!row || row.revision !== ack.revision) continue;
          await tx.objectStore('results').put({ ...row, synced: 1 });
          await dequeue(tx, 'result', ack.clientId);
        }
      });
    },

    pendingNotes: (): Promise<LocalNote[]> => pendingOf('note', 'notes'),

    markNoteSynced: (clientId: string, serverId: string): Promise<void> =>
      markSynced('notes', 'note', clientId, serverId),

    pendingPhotos: (): Promise<LocalPhoto[]> => pendingOf('photo', 'photos'),

    markPhotoSynced: (clientId: string, serverId: string): Promise<void> =>
      markSynced('photos', 'photo', clientId, serverId),

    // The driver signs: the report is kept as signed and waits in the outbox behind its answers.
    async signInspection(clientId: string, request: SubmitInspectionRequest): Promise<LocalInspection> {
      const stamp = now().toISOString();
      const signed = await write(['inspections', 'outbox'], async (tx) => {
        const inspection = await requireOpen(tx, clientId);
        const next: LocalInspection = {
          ...inspection,
          signed: { request: { ...request, signedAt: request.signedAt ?? stamp }, signedAt: request.signedAt ?? stamp },
          updatedAt: stamp,
        };
        await tx.objectStore('inspections').put(next);
        await enqueue(tx, 'submit', clientId, clientId);
        return next;
      });
      notifyWrite();
      return withDefaults(signed);
    },

    // Signed reports the server has not acknowledged yet, oldest first.
    pendingSubmits: (): Promise<LocalInspection[]> => pendingOf('submit', 'inspections'),

    // The server has the signed report: the outbox entry goes and the sent audio and photos are freed.
    async markSubmitted(clientId: string, submittedAt: string): Promise<void> {
      await write(['inspections', 'notes', 'photos', 'outbox'], async (tx) => {
        const inspection = await requireInspection(tx, clientId);
        await tx.objectStore('inspections').put({ ...inspection, submittedAt });
        await dequeue(tx, 'submit', clientId);
        await freeSentMedia(tx, clientId);
      });
    },

    // Entries of this inspection still waiting (refused ones included).
    async waitingOf(inspectionClientId: string): Promise<OutboxEntry[]> {
      return (await db.connection()).getAllFromIndex('outbox', 'inspectionClientId', inspectionClientId);
    },

    // The server refused this entry for a reason that sending again cannot fix.
    async refuse(kind: OutboxKind, clientId: string, refusal: Refusal): Promise<void> {
      await write(['outbox'], async (tx) => {
        const outbox = tx.objectStore('outbox');
        const seq = await outbox.index('kindClientId').getKey([kind, clientId]);
        const entry = seq === undefined ? undefined : await outbox.get(seq);
        if (entry) await outbox.put({ ...entry, refusal });
      });
      notifyWrite();
    },

    async listRefused(): Promise<RefusedEntry[]> {
      const entries = await (await db.connection()).getAll('outbox');
      return entries.flatMap(({ kind, clientId, inspectionClientId, refusal }) =>
        refusal ? [{ kind, clientId, inspectionClientId, refusal }] : [],
      );
    },

    // The driver asks to send an inspection's refused entries again (after reviewing a report, say).
    async clearRefusals(inspectionClientId: string): Promise<void> {
      await write(['outbox'], async (tx) => {
        const outbox = tx.objectStore('outbox');
        let cursor = await outbox.index('inspectionClientId').openCursor(inspectionClientId);
        while (cursor) {
          if (cursor.value.refusal) await cursor.update({ ...cursor.value, refusal: undefined });
          cursor = await cursor.continue();
        }
      });
      notifyWrite();
    },

    // The driver leaves a refused record out; the rest of the inspection goes on without it.
    async discardRefused(kind: OutboxKind, clientId: string): Promise<void> {
      await write(['outbox'], async (tx) => {
        const outbox = tx.objectStore('outbox');
        const seq = await outbox.index('kindClientId').getKey([kind, clientId]);
        const entry = seq === undefined ? undefined : await outbox.get(seq);
        if (seq !== undefined && entry?.refusal) await outbox.delete(seq);
      });
      notifyWrite();
    },

    async saveCached(key: string, value: unknown): Promise<CachedEntry> {
      const entry: CachedEntry = { key, value, savedAt: now().toISOString() };
      await (await db.connection()).put('cache', entry);
      return entry;
    },

    async readCached(key: string): Promise<CachedEntry | undefined> {
      return (await db.connection()).get('cache', key);
    },

    serverIdOf: async (inspectionClientId: string): Promise<string | undefined> =>
      (await db.connection()).get('inspections', inspectionClientId).then((row) => row?.serverId),
  };
}
