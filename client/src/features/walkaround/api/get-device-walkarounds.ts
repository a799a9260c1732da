import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PendingAcknowledgement, VehicleResponse } from '@yardcall/shared';
import {
  estimateStorageRoom,
  getOfflineRuntime,
  readKeptStartData,
  type LocalInspection,
  type RefusedEntry,
  type StorageRoom,
} from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

export interface DeviceWalkaround {
  inspection: LocalInspection;
  answered: number;
  items: number;
  // Outbox entries of this walk-around still waiting (refused ones included).
  waiting: number;
  refused: RefusedEntry[];
}

// Everything on this phone the driver home shows: walk-arounds to resume, signed reports waiting to
// be sent, refusals, reviews waiting (from the last kept copy), and room left for notes and photos.
export interface DeviceWalkarounds {
  unfinished: DeviceWalkaround[];
  signedWaiting: DeviceWalkaround[];
  refused: DeviceWalkaround[];
  pendingAcknowledgements: { vehicle: Pick<VehicleResponse, 'id' | 'unitNumber'>; pending: PendingAcknowledgement }[];
  outOfService: Pick<VehicleResponse, 'id' | 'unitNumber' | 'statusReason'>[];
  storage: StorageRoom | null;
  keptAt: string | null;
}

const newestFirst = (a: DeviceWalkaround, b: DeviceWalkaround) =>
  b.inspection.updatedAt.localeCompare(a.inspection.updatedAt);

export async function getDeviceWalkarounds(): Promise<DeviceWalkarounds> {
  const { store } = getOfflineRuntime();
  const [inspections, refusals, kept, storage] = await Promise.all([
    store.listInspections(),
    store.listRefused(),
    readKeptStartData(),
    estimateStorageRoom(),
  ]);
  const all = await Promise.all(
    inspections.map(async (inspection): Promise<DeviceWalkaround> => {
      const [results, waiting] = await Promise.all([
        store.getResults(inspection.clientId),
        store.countWaitingFor(inspection.clientId),
      ]);
      return {
        inspection,
        answered: results.length,
        items: inspection.checklist.items.length,
        waiting,
        refused: refusals.filter((entry) => entry.inspectionClientId === inspection.clientId),
      };
    }),
  );
  const recentUnitIds = new Set(all.flatMap((w) => w.inspection.vehicles.map((v) => v.id)));
  const vehicles = kept?.data.vehicles ?? [];
  return {
    unfinished: all.filter((w) => !w.inspection.signed).sort(newestFirst),
    signedWaiting: all.filter((w) => w.inspection.signed && !w.inspection.submittedAt).sort(newestFirst),
    refused: all.filter((w) => w.refused.length > 0).sort(newestFirst),
    pendingAcknowledgements: vehicles.flatMap((vehicle) => {
      const pending = kept?.data.pendingAcknowledgements[vehicle.id];
      return pending ? [{ vehicle: { id: vehicle.id, unitNumber: vehicle.unitNumber }, pending }] : [];
    }),
    // Only units this phone inspected: the whole fleet's status is the office's board.
    outOfService: vehicles
      .filter((v) => v.status === 'out_of_service' && recentUnitIds.has(v.id))
      .map(({ id, unitNumber, statusReason }) => ({ id, unitNumber, statusReason })),
    storage,
    keptAt: kept?.savedAt ?? null,
  };
}

export function deviceWalkaroundsQueryOptions() {
  return queryOptions({
    queryKey: walkaroundKeys.localLists(),
    queryFn: getDeviceWalkarounds,
    networkMode: 'always',
    staleTime: 0,
  });
}

export function useDeviceWalkarounds() {
  return useQuery(deviceWalkaroundsQueryOptions());
}
