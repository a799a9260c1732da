import { useSyncExternalStore } from 'react';
import { getOfflineRuntime } from './offline-runtime';
import type { SyncEngine, SyncStatus } from './sync-engine';

type StatusSource = Pick<SyncEngine, 'subscribe' | 'getStatus'>;

// For the "n waiting to sync" line: re-renders whenever the engine's status changes.
export function useSyncStatus(engine: StatusSource = getOfflineRuntime().engine): SyncStatus {
  return useSyncExternalStore(engine.subscribe, engine.getStatus, engine.getStatus);
}
