import { openOfflineDb } from './offline-db';
import { createOfflineStore, type OfflineStore } from './offline-store';
import { createSyncEngine, type SyncEngine } from './sync-engine';

export interface OfflineRuntime {
  store: OfflineStore;
  engine: SyncEngine;
}

let runtime: OfflineRuntime | null = null;

// One store and one engine per page, made on first use; the app calls `engine.start()` once.
export function getOfflineRuntime(): OfflineRuntime {
  if (!runtime) {
    const store = createOfflineStore(openOfflineDb());
    runtime = { store, engine: createSyncEngine({ store }) };
  }
  return runtime;
}
