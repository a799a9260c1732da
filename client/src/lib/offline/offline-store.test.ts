import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import type { Checklist, CreateInspectionRequest } from '@yardcall/shared';
import { openOfflineDb, type OfflineDb } from './offline-db';
import { createOfflineStore, SignedInspectionError } from './offline-store';

const checklist: Checklist = { kind: 'post_trip', locale: 'es', zones: [], stops: [], items: [] };
const request = (clientId: string): CreateInspectionRequest => ({
  clientId,
  vehicleIds: ['veh-bus-27'],
  kind: 'post_trip',
  startedAt: '2026-12-01T18:05:00.000Z',
});

const opened: OfflineDb[] = [];
let counter = 0;
function freshName(): string {
  counter += 1;
  return `store-test-${counter}`;
}
function open(name: string) {
  const db = openOfflineDb(name);
  opened.push(db);
  return createOfflineStore(db);
}

afterEach(() => {
  for (const db of opened.splice(0)) db.close();
});

describe('offline store', () => {
  it('keeps the inspection, its voice-loop state and a note through a reload', async () => {
    const name = freshName();
    const before = open(name);
    await before.saveInspection({
      request: request('insp-b'),
      vehicles: [{ id: 'veh-bus-27', unitNumber: 'B-27', kind: 'bus' }],
      checklist,
    });
    await before.saveVoiceState('insp-b', { step: 12, pendingConfirmation: null, zones: ['front', 'left'] });
    await before.saveNote({
      clientId: 'note-9',
      inspectionClientId: 'insp-b',
      itemKey: 'mirrors.left',
      audio: new Blob([new Uint8Array([1, 2, 3, 250])], { type: 'audio/mp4' }),
      durationMs: 2400,
    });
    before.db.close();

    const after = open(name);
    expect(await after.getInspection('insp-b')).toMatchObject({
      serverId: undefined,
      vehicles: [{ unitNumber: 'B-27' }],
      checklist: { locale: 'es' },
      voiceState: { step: 12, pendingConfirmation: null, zones: ['front', 'left'] },
    });
    const [note] = await after.getNotes('insp-b');
    expect(note).toMatchObject({ mimeType: 'audio/mp4', durationMs: 2400, synced: 0 });
    expect([...new Uint8Array(note?.bytes ?? new ArrayBuffer(0))]).toEqual([1, 2, 3, 250]);
    // The create and the note wait; the voice state is never sent.
    expect(await after.countWaiting()).toBe(2);
  });

  it('waits for nothing when the inspection was created online', async () => {
    const store = open(freshName());
    await store.saveInspection({ request: request('insp-c'), vehicles: [], checklist, serverId: 'srv-77' });
    expect(await store.countWaiting()).toBe(0);
    // Saving it again without the server id keeps what was learnt.
    await store.saveInspection({ request: request('insp-c'), vehicles: [], checklist });
    expect(await store.getInspection('insp-c')).toMatchObject({ serverId: 'srv-77', synced: 1 });
    expect(await store.countWaiting()).toBe(0);
  });

  it('queues a re-answered result once, keeping its first place in the outbox', async () => {
    const store = open(freshName());
    await store.saveInspection({ request: request('insp-d'), vehicles: [], checklist, serverId: 'srv-1' });
    const answeredAt = '2026-12-01T18:06:00.000Z';
    await store.saveResults('insp-d', [{ clientId: 'r-1', itemKey: 'horn', answer: 'pass', answeredAt }]);
    await store.saveResults('insp-d', [{ clientId: 'r-2', itemKey: 'wipers', answer: 'pass', answeredAt }]);
    await store.saveResults('insp-d', [{ clientId: 'r-1', itemKey: 'horn', answer: 'defect', answeredAt }]);

    const pending = await store.pendingResults();
    expect(pending.map((entry) => [entry.upsert.clientId, entry.upsert.answer, entry.revision])).toEqual([
      ['r-1', 'defect', 2],
      ['r-2', 'pass', 1],
    ]);
    // An acknowledgement of the first revision does not settle the second.
    await store.markResultsSynced([{ clientId: 'r-1', revision: 1 }]);
    expect(await store.countWaiting()).toBe(2);
    await store.markResultsSynced([{ clientId: 'r-1', revision: 2 }]);
    expect(await store.countWaiting()).toBe(1);
  });

  it('refuses a result for an inspection this device does not hold', async () => {
    const store = open(freshName());
    await expect(
      store.saveResults('insp-missing', [
        { clientId: 'r-1', itemKey: 'horn', answer: 'pass', answeredAt: '2026-12-01T18:06:00.000Z' },
      ]),
    ).rejects.toThrow('No inspection insp-missing is stored on this device.');
    expect(await store.countWaiting()).toBe(0);
  });

  it('keeps a signed walk-around read-only: no answer, note or voice state is added after the signature', async () => {
    const store = open(freshName());
    await store.saveInspection({
      request: request('insp-1'),
      vehicles: [],
      checklist,
      requiredReadings: ['tire_pressure'],
    });
    await store.signInspection('insp-1', { signature: { name: 'Ana Ruiz' }, signedAt: '2026-12-01T18:30:00.000Z' });

    const answer = {
      clientId: 'r-1',
      itemKey: 'horn',
      answer: 'pass' as const,
      answeredAt: '2026-12-01T18:31:00.000Z',
    };
    await expect(store.saveResults('insp-1', [answer])).rejects.toThrow(SignedInspectionError);
    await expect(store.saveVoiceState('insp-1', { at: 3 })).rejects.toThrow(SignedInspectionError);
    await expect(
      store.saveNote({
        clientId: 'n-1',
        inspectionClientId: 'insp-1',
        itemKey: 'horn',
        audio: new Blob(['x'], { type: 'audio/ogg' }),
        durationMs: 500,
      }),
    ).rejects.toThrow(SignedInspectionError);
    const kept = await store.getInspection('insp-1');
    expect(kept).toMatchObject({
      requiredReadings: ['tire_pressure'],
      signed: { signedAt: '2026-12-01T18:30:00.000Z' },
    });
    expect((await store.waitingOf('insp-1')).map((entry) => entry.kind)).toEqual(['inspection', 'submit']);
  });

  it('keeps server data for a start with no signal, with the time it was saved', async () => {
    const store = open(freshName());
    expect(await store.readCached('start')).toBeUndefined();
    await store.saveCached('start', { units: ['KV-101'] });
    expect(await open(freshName()).readCached('start')).toBeUndefined();
    expect(await store.readCached('start')).toMatchObject({ key: 'start', value: { units: ['KV-101'] } });
  });
});
