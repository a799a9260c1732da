import { Dexie, type EntityTable } from 'dexie';
import type { Checklist, CreateInspectionRequest, InspectionVehicle, ResultUpsert } from '@yardcall/shared';

export const OFFLINE_DB_NAME = 'yardcall-offline';

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
  synced: SyncedFlag;
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
  createdAt: string;
}

export const OUTBOX_KINDS = ['inspection', 'result', 'note', 'photo'] as const;
export type OutboxKind = (typeof OUTBOX_KINDS)[number];

// What is waiting to be sent, in the order it was written.
export interface OutboxEntry {
  seq?: number;
  kind: OutboxKind;
  clientId: string;
  inspectionClientId: string;
}

export type OfflineDb = Dexie & {
  inspections: EntityTable<LocalInspection, 'clientId'>;
  results: EntityTable<LocalResult, 'clientId'>;
  notes: EntityTable<LocalNote, 'clientId'>;
  photos: EntityTable<LocalPhoto, 'clientId'>;
  outbox: EntityTable<OutboxEntry, 'seq'>;
};

// Each call opens its own connection: a new instance on the same name is what a reload sees.
export function openOfflineDb(name: string = OFFLINE_DB_NAME): OfflineDb {
  const db = new Dexie(name) as OfflineDb;
  db.version(1).stores({
    inspections: 'clientId, serverId, synced',
    results: 'clientId, inspectionClientId, [inspectionClientId+itemKey], synced',
    notes: 'clientId, inspectionClientId, synced',
    photos: 'clientId, inspectionClientId, synced',
    outbox: '++seq, &[kind+clientId], kind, inspectionClientId',
  });
  return db;
}
