import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type {
  Checklist,
  CreateInspectionRequest,
  InspectionVehicle,
  ReadingRule,
  ResultUpsert,
  SubmitInspectionRequest,
} from '@yardcall/shared';

export const OFFLINE_DB_NAME = 'yardcall-walkarounds';

// Opaque to this store: the voice loop saves its own state and reads it back to resume.
export type JsonValue = string | number | boolean | null | JsonValue[] | { [key: string]: JsonValue };

// IndexedDB cannot index booleans, so flags are 0/1.
export type SyncedFlag = 0 | 1;

export interface LocalInspection {
  // The client-made id is the local key and the create's idempotency key.
  clientId: string;
  serverId?: string;
  vehicles: InspectionVehicle[];
  kind: CreateInspectionRequest['kind'];
  request: CreateInspectionRequest;
  checklist: Checklist;
  voiceState?: JsonValue;
  // The organisation's required readings when the walk-around began (the voice loop reads them).
  requiredReadings: ReadingRule[];
  synced: SyncedFlag;
  // Signed on this device: from here the walk-around is read-only and the submit waits in the outbox.
  signed?: { request: SubmitInspectionRequest; signedAt: string };
  // When the server acknowledged the signed report.
  submittedAt?: string;
  createdAt: string;
  updatedAt: string;
}

export interface LocalResult {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  upsert: ResultUpsert;
  synced: SyncedFlag;
  // Bumped on every local write: an acknowledgement only settles the revision that was sent.
  revision: number;
  updatedAt: string;
}

// Bytes, not a Blob: an ArrayBuffer clones the same in every IndexedDB, while stored Blobs have had
// browser bugs (from memory) and do not survive fake-indexeddb under jsdom.
export interface LocalNote {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  bytes: ArrayBuffer;
  mimeType: string;
  durationMs: number;
  heard?: string;
  synced: SyncedFlag;
  serverId?: string;
  // 1 once the bytes were dropped: the server has them and the run is closed.
  freed?: SyncedFlag;
  createdAt: string;
}

export interface LocalPhoto {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  bytes: ArrayBuffer;
  mimeType: string;
  synced: SyncedFlag;
  serverId?: string;
  freed?: SyncedFlag;
  createdAt: string;
}

export const OUTBOX_KINDS = ['inspection', 'result', 'note', 'photo', 'submit'] as const;
export type OutboxKind = (typeof OUTBOX_KINDS)[number];

// The server's answer to something that sending again cannot fix; the entry waits for the driver.
export interface Refusal {
  status: number;
  message: string;
  at: string;
}

// What is waiting to be sent, in the order it was written.
export interface OutboxEntry {
  seq?: number;
  kind: OutboxKind;
  clientId: string;
  inspectionClientId: string;
  refusal?: Refusal;
}

// Server data kept for a start with no signal (units, acknowledgements, required readings).
export interface CachedEntry {
  key: string;
  value: unknown;
  savedAt: string;
}

export interface OfflineSchema extends DBSchema {
  inspections: { key: string; value: LocalInspection; indexes: { serverId: string; synced: SyncedFlag } };
  results: {
    key: string;
    value: LocalResult;
    indexes: { inspectionClientId: string; inspectionItem: [string, string]; synced: SyncedFlag };
  };
  notes: { key: string; value: LocalNote; indexes: { inspectionClientId: string; synced: SyncedFlag } };
  photos: { key: string; value: LocalPhoto; indexes: { inspectionClientId: string; synced: SyncedFlag } };
  outbox: {
    key: number;
    value: OutboxEntry;
    indexes: { kindClientId: [OutboxKind, string]; kind: OutboxKind; inspectionClientId: string };
  };
  cache: { key: string; value: CachedEntry };
}

export type OfflineStoreName = 'inspections' | 'results' | 'notes' | 'photos' | 'outbox' | 'cache';
export type OfflineConnection = IDBPDatabase<OfflineSchema>;

export interface OfflineDb {
  name: string;
  // The connection, opened on first use and shared after.
  connection(): Promise<OfflineConnection>;
  close(): void;
}

// Version 1: the walk-around and its outbox; 2 adds the cache of server data for offline starts.
const SCHEMA_VERSION = 2;

function createSchema(db: OfflineConnection): void {
  const inspections = db.createObjectStore('inspections', { keyPath: 'clientId' });
  inspections.createIndex('serverId', 'serverId');
  inspections.createIndex('synced', 'synced');
  const results = db.createObjectStore('results', { keyPath: 'clientId' });
  results.createIndex('inspectionClientId', 'inspectionClientId');
  results.createIndex('inspectionItem', ['inspectionClientId', 'itemKey']);
  results.createIndex('synced', 'synced');
  for (const name of ['notes', 'photos'] as const) {
    const store = db.createObjectStore(name, { keyPath: 'clientId' });
    store.createIndex('inspectionClientId', 'inspectionClientId');
    store.createIndex('synced', 'synced');
  }
  const outbox = db.createObjectStore('outbox', { keyPath: 'seq', autoIncrement: true });
  outbox.createIndex('kindClientId', ['kind', 'clientId'], { unique: true });
  outbox.createIndex('kind', 'kind');
  outbox.createIndex('inspectionClientId', 'inspectionClientId');
}

// Each call makes its own connection: a new one on the same name is what a reload sees.
export function openOfflineDb(name: string = OFFLINE_DB_NAME): OfflineDb {
  let opening: Promise<OfflineConnection> | undefined;
  return {
    name,
    connection: () =>
      (opening ??= openDB<OfflineSchema>(name, SCHEMA_VERSION, {
        upgrade(db, oldVersion) {
          if (oldVersion < 1) createSchema(db);
          if (oldVersion < 2) db.createObjectStore('cache', { keyPath: 'key' });
        },
      })),
    close() {
      void opening?.then((db) => db.close());
      opening = undefined;
    },
  };
}
