import type { Checklist, CreateInspectionRequest, InspectionVehicle, ResultUpsert } from '@yardcall/shared';
import type {
  JsonValue,
  LocalInspection,
  LocalNote,
  LocalPhoto,
  LocalResult,
  OfflineDb,
  OutboxEntry,
  OutboxKind,
} from './offline-db';

export interface NewInspection {
  request: CreateInspectionRequest;
  vehicles: InspectionVehicle[];
  checklist: Checklist;
  voiceState?: JsonValue;
  // Known when the inspection was created online; then nothing waits to be sent.
  serverId?: string;
}

export interface NewNote {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  audio: Blob;
  // Defaults to the Blob's own type.
  mimeType?: string;
  durationMs: number;
  heard?: string;
}

export interface NewPhoto {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  image: Blob;
  mimeType?: string;
}

export interface PendingResult {
  inspectionClientId: string;
  upsert: ResultUpsert;
  revision: number;
}

export interface ResultAck {
  clientId: string;
  revision: number;
}

type WriteListener = () => void;

export type OfflineStore = ReturnType<typeof createOfflineStore>;

// Every answer, note and photo lands here first; the sync engine sends what the outbox lists.
export function createOfflineStore(db: OfflineDb, now: () => Date = () => new Date()) {
  const listeners = new Set<WriteListener>();
  const notifyWrite = () => {
    for (const listener of listeners) listener();
  };

  async function enqueue(kind: OutboxKind, clientId: string, inspectionClientId: string): Promise<void> {
    // Unique on kind+clientId: a second write of something still waiting keeps its first place.
    const existing = await db.outbox.where('[kind+clientId]').equals([kind, clientId]).first();
    if (!existing) await db.outbox.add({ kind, clientId, inspectionClientId });
  }

  async function dequeue(kind: OutboxKind, clientId: string): Promise<void> {
    await db.outbox.where('[kind+clientId]').equals([kind, clientId]).delete();
  }

  async function requireInspection(clientId: string): Promise<LocalInspection> {
    const inspection = await db.inspections.get(clientId);
    if (!inspection) throw new Error(`No inspection ${clientId} is stored on this device.`);
    return inspection;
  }

  async function pendingOf(kind: OutboxKind): Promise<OutboxEntry[]> {
    return db.outbox.where('kind').equals(kind).sortBy('seq');
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
        voiceState: input.voiceState,
        synced: input.serverId ? 1 : 0,
        createdAt: stamp,
        updatedAt: stamp,
      };
      await db.transaction('rw', db.inspections, db.outbox, async () => {
        const existing = await db.inspections.get(inspection.clientId);
        // Saving again never forgets a server id already learnt.
        if (existing?.serverId) {
          inspection.serverId = existing.serverId;
          inspection.synced = 1;
        }
        if (existing) inspection.createdAt = existing.createdAt;
        await db.inspections.put(inspection);
        if (!inspection.serverId) await enqueue('inspection', inspection.clientId, inspection.clientId);
      });
      notifyWrite();
      return inspection;
    },

    // Local only: the voice loop's resume point is never sent.
    async saveVoiceState(inspectionClientId: string, voiceState: JsonValue): Promise<void> {
      const updated = await db.inspections.update(inspectionClientId, {
        voiceState,
        updatedAt: now().toISOString(),
      });
      if (updated === 0) throw new Error(`No inspection ${inspectionClientId} is stored on this device.`);
    },

    getInspection(clientId: string): Promise<LocalInspection | undefined> {
      return db.inspections.get(clientId);
    },

    listInspections(): Promise<LocalInspection[]> {
      return db.inspections.orderBy('clientId').toArray();
    },

    async saveResults(inspectionClientId: string, upserts: ResultUpsert[]): Promise<void> {
      const stamp = now().toISOString();
      await db.transaction('rw', db.inspections, db.results, db.outbox, async () => {
        await requireInspection(inspectionClientId);
        for (const upsert of upserts) {
          const existing = await db.results.get(upsert.clientId);
          if (existing && existing.inspectionClientId !== inspectionClientId) {
            throw new Error(`Result ${upsert.clientId} belongs to another inspection.`);
          }
          await db.results.put({
            clientId: upsert.clientId,
            inspectionClientId,
            itemKey: upsert.itemKey,
            upsert,
            synced: 0,
            revision: (existing?.revision ?? 0) + 1,
            updatedAt: stamp,
          });
          await enqueue('result', upsert.clientId, inspectionClientId);
        }
      });
      notifyWrite();
    },

    getResults(inspectionClientId: string): Promise<LocalResult[]> {
      return db.results.where('inspectionClientId').equals(inspectionClientId).toArray();
    },

    async saveNote(input: NewNote): Promise<void> {
      const bytes = await input.audio.arrayBuffer();
      const note: LocalNote = {
        clientId: input.clientId,
        inspectionClientId: input.inspectionClientId,
        itemKey: input.itemKey,
        bytes,
        mimeType: input.mimeType ?? input.audio.type,
        durationMs: input.durationMs,
        heard: input.heard,
        synced: 0,
        createdAt: now().toISOString(),
      };
      await db.transaction('rw', db.inspections, db.notes, db.outbox, async () => {
        await requireInspection(input.inspectionClientId);
        if ((await db.notes.get(note.clientId))?.synced === 1) return;
        await db.notes.put(note);
        await enqueue('note', note.clientId, note.inspectionClientId);
      });
      notifyWrite();
    },

    getNotes(inspectionClientId: string): Promise<LocalNote[]> {
      return db.notes.where('inspectionClientId').equals(inspectionClientId).toArray();
    },

    async savePhoto(input: NewPhoto): Promise<void> {
      const bytes = await input.image.arrayBuffer();
      const photo: LocalPhoto = {
        clientId: input.clientId,
        inspectionClientId: input.inspectionClientId,
        itemKey: input.itemKey,
        bytes,
        mimeType: input.mimeType ?? input.image.type,
        synced: 0,
        createdAt: now().toISOString(),
      };
      await db.transaction('rw', db.inspections, db.photos, db.outbox, async () => {
        await requireInspection(input.inspectionClientId);
        if ((await db.photos.get(photo.clientId))?.synced === 1) return;
        await db.photos.put(photo);
        await enqueue('photo', photo.clientId, photo.inspectionClientId);
      });
      notifyWrite();
    },

    getPhotos(inspectionClientId: string): Promise<LocalPhoto[]> {
      return db.photos.where('inspectionClientId').equals(inspectionClientId).toArray();
    },

    countWaiting(): Promise<number> {
      return db.outbox.count();
    },

    // What the sync engine reads and settles.

    async pendingCreates(): Promise<LocalInspection[]> {
      const entries = await pendingOf('inspection');
      const rows = await db.inspections.bulkGet(entries.map((entry) => entry.clientId));
      return rows.filter((row): row is LocalInspection => row !== undefined);
    },

    async markInspectionCreated(clientId: string, serverId: string): Promise<void> {
      await db.transaction('rw', db.inspections, db.outbox, async () => {
        await db.inspections.update(clientId, { serverId, synced: 1 });
        await dequeue('inspection', clientId);
      });
    },

    async pendingResults(): Promise<PendingResult[]> {
      const entries = await pendingOf('result');
      const rows = await db.results.bulkGet(entries.map((entry) => entry.clientId));
      return rows
        .filter((row): row is LocalResult => row !== undefined)
        .map((row) => ({ inspectionClientId: row.inspectionClientId, upsert: row.upsert, revision: row.revision }));
    },

    // Settles only the revisions the server saw; a result changed meanwhile stays queued.
    async markResultsSynced(acks: ResultAck[]): Promise<void> {
      await db.transaction('rw', db.results, db.outbox, async () => {
        for (const ack of acks) {
          const row = await db.results.get(ack.clientId);
          if (!row || row.revision !== ack.revision) continue;
          await db.results.update(ack.clientId, { synced: 1 });
          await dequeue('result', ack.clientId);
        }
      });
    },

    async pendingNotes(): Promise<LocalNote[]> {
      const entries = await pendingOf('note');
      const rows = await db.notes.bulkGet(entries.map((entry) => entry.clientId));
      return rows.filter((row): row is LocalNote => row !== undefined);
    },

    async markNoteSynced(clientId: string, serverId: string): Promise<void> {
      await db.transaction('rw', db.notes, db.outbox, async () => {
        await db.notes.update(clientId, { serverId, synced: 1 });
        await dequeue('note', clientId);
      });
    },

    async pendingPhotos(): Promise<LocalPhoto[]> {
      const entries = await pendingOf('photo');
      const rows = await db.photos.bulkGet(entries.map((entry) => entry.clientId));
      return rows.filter((row): row is LocalPhoto => row !== undefined);
    },

    async markPhotoSynced(clientId: string, serverId: string): Promise<void> {
      await db.transaction('rw', db.photos, db.outbox, async () => {
        await db.photos.update(clientId, { serverId, synced: 1 });
        await dequeue('photo', clientId);
      });
    },

    serverIdOf: async (inspectionClientId: string): Promise<string | undefined> =>
      (await db.inspections.get(inspectionClientId))?.serverId,
  };
}
