export { OFFLINE_DB_NAME, openOfflineDb } from './offline-db';
export type { OfflineDb } from './offline-db';
// The rows the phone keeps, as the screens and the sync engine read them.
export type * from './records';
export { createOfflineStore, SignedInspectionError } from './offline-store';
export type { LocalWalkaround, NewInspection, NewNote, NewPhoto, OfflineStore, RefusedEntry } from './offline-store';
export { getStartData, readKeptStartData, START_DATA_KEY } from './start-data';
export { fetchKeepingCopy, readKeptCopy } from './kept-copy';
export type { KeptCopy } from './kept-copy';
export type { KeptStartData, StartData } from './start-data';
export { estimateStorageRoom } from './storage-estimate';
export { describeCopyAge } from './copy-age';
export { registerAppServiceWorker, useAppUpdate } from './app-update';
export type { StorageRoom } from './storage-estimate';
export {
  createSyncEngine,
  defaultRetryDelayMs,
  isRetryable,
  MAX_RESULTS_PER_PUT,
  SYNC_DEBOUNCE_MS,
} from './sync-engine';
export type { SyncEngine, SyncEngineOptions, SyncStatus } from './sync-engine';
export { apiSyncTransport } from './sync-transport';
export type { SyncTransport } from './sync-transport';
export { requestPersistentStorage } from './persistent-storage';
export type { PersistOutcome } from './persistent-storage';
export { getOfflineRuntime } from './offline-runtime';
export type { OfflineRuntime } from './offline-runtime';
export { useSyncStatus } from './use-sync-status';
