import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type * as Row from './records';

export const OFFLINE_DB_NAME = 'yardcall-walkarounds';

export interface OfflineSchema extends DBSchema {
  inspections: { key: string; value: Row.LocalInspection; indexes: { serverId: string; synced: Row.SyncedFlag } };
  results: {
    key: string;
    value: Row.LocalResult;
    indexes: { inspectionClientId: string; inspectionItem: [string, string]; synced: Row.SyncedFlag };
  };
  notes: { key: string; value: Row.LocalNote; indexes: { inspectionClientId: string; synced: Row.SyncedFlag } };
  photos: { key: string; value: Row.LocalPhoto; indexes: { inspectionClientId: string; synced: Row.SyncedFlag } };
  outbox: {
    key: number;
    value: Row.OutboxEntry;
    indexes: { kindClientId: [Row.OutboxKind, string]; kind: Row.OutboxKind; inspectionClientId: string };
  };
  cache: { key: string; value: Row.CachedEntry };
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
