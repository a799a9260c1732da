import type { OrganizationSummary, PendingAcknowledgement, ReadingRule, VehicleResponse } from '@yardcall/shared';
import { api } from '../api-client';
import { fetchKeepingCopy, readKeptCopy, type KeptCopy } from './kept-copy';

// What a walk-around needs from the server before it starts, kept on the phone for a start with no
// signal: the units (with each one's status from its last report), the reviews waiting for this
// driver, and the organisation's required readings.
export interface StartData {
  vehicles: VehicleResponse[];
  // Per unit id: the last report waiting for this driver's review, or null.
  pendingAcknowledgements: Record<string, PendingAcknowledgement | null>;
  requiredReadings: ReadingRule[];
}

export type KeptStartData = KeptCopy<StartData>;

export const START_DATA_KEY = 'start-data';

function isStartData(value: unknown): value is StartData {
  if (typeof value !== 'object' || value === null) return false;
  const data = value as Partial<StartData>;
  return (
    Array.isArray(data.vehicles) &&
    typeof data.pendingAcknowledgements === 'object' &&
    Array.isArray(data.requiredReadings)
  );
}

async function fetchStartData(signal?: AbortSignal): Promise<StartData> {
  const [vehicles, organization] = await Promise.all([
    api.get<VehicleResponse[]>('/vehicles', { signal }),
    api.get<OrganizationSummary>('/organizations/current', { signal }),
  ]);
  const pending = await Promise.all(
    vehicles.map(async (vehicle) => {
      const found = await api.get<PendingAcknowledgement | undefined>(
        `/vehicles/${encodeURIComponent(vehicle.id)}/pending-acknowledgement`,
        { signal },
      );
      return [vehicle.id, found ?? null] as const;
    }),
  );
  return {
    vehicles,
    pendingAcknowledgements: Object.fromEntries(pending),
    requiredReadings: organization.requiredReadings ?? [],
  };
}

// Fresh from the server when it answers (and kept), the phone's last copy when it does not.
export function getStartData(signal?: AbortSignal): Promise<KeptStartData> {
  return fetchKeepingCopy(START_DATA_KEY, () => fetchStartData(signal), isStartData);
}

// The phone's copy alone (the driver home reads it without asking the server).
export function readKeptStartData(): Promise<KeptStartData | null> {
  return readKeptCopy(START_DATA_KEY, isStartData);
}
