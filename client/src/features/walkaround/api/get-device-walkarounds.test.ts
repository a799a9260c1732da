import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import type { Checklist, CreateInspectionRequest } from '@yardcall/shared';
import { getOfflineRuntime, START_DATA_KEY } from '@/lib/offline';
import { getDeviceWalkarounds } from './get-device-walkarounds';

const checklist = (keys: string[]) => ({ items: keys.map((key) => ({ key })) }) as unknown as Checklist;
const request = (clientId: string): CreateInspectionRequest => ({
  clientId,
  vehicleIds: ['veh-101'],
  kind: 'pre_trip',
  startedAt: '2026-12-01T05:40:00.000Z',
});
const vehicles = [{ id: 'veh-101', unitNumber: 'KV-101', kind: 'tractor' as const }];

describe('the walk-arounds on this phone, for the driver home', () => {
  it('sorts walk-arounds to resume, signed reports waiting, refusals and the reviews the kept copy names', async () => {
    const { store } = getOfflineRuntime();
    await store.saveInspection({ request: request('open-1'), vehicles, checklist: checklist(['a', 'b', 'c']) });
    await store.saveResults('open-1', [
      { clientId: 'r-1', itemKey: 'a', answer: 'pass', answeredAt: '2026-12-01T05:41:00.000Z' },
    ]);
    await store.saveInspection({ request: request('signed-1'), vehicles, checklist: checklist(['a']) });
    await store.signInspection('signed-1', { signature: { name: 'Dana Okafor' } });
    await store.refuse('inspection', 'open-1', {
      status: 409,
      message: 'Review the last report of unit KV-101 first.',
      at: '2026-12-01T06:00:00.000Z',
    });
    await store.saveCached(START_DATA_KEY, {
      vehicles: [
        {
          id: 'veh-101',
          unitNumber: 'KV-101',
          kind: 'tractor',
          status: 'out_of_service',
          statusReason: 'Steer tire tread',
        },
        { id: 'veh-102', unitNumber: 'KV-102', kind: 'tractor', status: 'in_service', statusReason: null },
      ],
      pendingAcknowledgements: { 'veh-102': { inspectionId: 'i-9', defects: [{}, {}] }, 'veh-101': null },
      requiredReadings: [],
    });

    const device = await getDeviceWalkarounds();

    expect(device.unfinished.map((w) => [w.inspection.clientId, w.answered, w.items])).toEqual([['open-1', 1, 3]]);
    expect(device.signedWaiting.map((w) => w.inspection.clientId)).toEqual(['signed-1']);
    expect(device.refused.map((w) => [w.inspection.clientId, w.refused[0]?.refusal.status])).toEqual([['open-1', 409]]);
    expect(device.pendingAcknowledgements.map((p) => p.vehicle.unitNumber)).toEqual(['KV-102']);
    // Only units this phone inspected: KV-101 is one of them.
    expect(device.outOfService).toEqual([{ id: 'veh-101', unitNumber: 'KV-101', statusReason: 'Steer tire tread' }]);
    expect(device.keptAt).not.toBeNull();
  });
});
