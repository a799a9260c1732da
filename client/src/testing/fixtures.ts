import { DEFAULT_DISPLAY_SETTINGS, type Role, type UserSummary, type VehicleResponse } from '@yardcall/shared';

// Invented people and units of an invented fleet.
const NAMES: Record<Role, string> = {
  driver: 'Dana Okafor',
  mechanic: 'Luis Arrieta',
  supervisor: 'Priya Lindqvist',
  trainer: 'Sam Whitcombe',
  admin: 'Morgan Tessaro',
};

export function makeUser(role: Role, patch: Partial<UserSummary> = {}): UserSummary {
  return {
    id: `user-${role}`,
    email: `${role}@yardcall.test`,
    name: NAMES[role],
    role,
    isStudent: false,
    status: 'active',
    organizationId: 'org-1',
    organizationName: 'Bramblecote Haulage',
    settings: { ...DEFAULT_DISPLAY_SETTINGS },
    ...patch,
  };
}

export function makeVehicle(patch: Partial<VehicleResponse> = {}): VehicleResponse {
  return {
    id: 'veh-1',
    unitNumber: 'T-412',
    kind: 'tractor',
    vin: '1BCDE23F4GH567890',
    plate: 'BHX 4412',
    status: 'in_service',
    statusReason: null,
    statusSince: '2026-11-01T08:00:00.000Z',
    config: {
      axles: [
        {
          position: 'steer',
          tires: 'single',
          brake: 'air_drum',
          chamber: { size: 20, stroke: 'long' },
          tire: { size: '11R22.5', coldInflationPsi: 110, sidewallMaxPsi: 120 },
        },
      ],
      steering: { wheelDiameterIn: 20, type: 'power' },
    },
    createdAt: '2026-11-01T08:00:00.000Z',
    updatedAt: '2026-11-01T08:00:00.000Z',
    ...patch,
  };
}
