import 'fake-indexeddb/auto';
import { act, renderHook } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { Checklist } from '@yardcall/shared';
import { openOfflineDb } from './offline-db';
import { createOfflineStore } from './offline-store';
import { createSyncEngine } from './sync-engine';
import { useSyncStatus } from './use-sync-status';

const checklist: Checklist = { kind: 'pre_trip', locale: 'en', zones: [], stops: [], items: [] };
const db = openOfflineDb('hook-test');

afterEach(() => db.close());

describe('useSyncStatus', () => {
  it('shows how many writes wait while offline', async () => {
    const store = createOfflineStore(db);
    const engine = createSyncEngine({ store, isOnline: () => false, debounceMs: 5 });
    const { result } = renderHook(() => useSyncStatus(engine));
    expect(result.current).toEqual({ waiting: 0, syncing: false });

    await act(async () => {
      await engine.start();
      await store.saveInspection({
        request: { clientId: 'insp-h', vehicleIds: ['veh-1'], kind: 'pre_trip', startedAt: '2026-12-01T06:00:00.000Z' },
        vehicles: [],
        checklist,
      });
      await store.saveResults('insp-h', [
        { clientId: 'r-1', itemKey: 'horn', answer: 'pass', answeredAt: '2026-12-01T06:01:00.000Z' },
      ]);
      await engine.syncNow();
    });

    expect(result.current).toMatchObject({ waiting: 2, syncing: false });
    engine.stop();
  });
});
