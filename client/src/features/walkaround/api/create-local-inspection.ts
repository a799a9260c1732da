import { useMutation, useQueryClient } from '@tanstack/react-query';
import { buildChecklist, type InspectionKind, type Locale, type VehicleResponse } from '@yardcall/shared';
import { getOfflineRuntime, type LocalInspection } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

export interface NewWalkaround {
  // Power unit first, then the trailer.
  vehicles: VehicleResponse[];
  kind: InspectionKind;
  locale: Locale;
}

// The checklist is built here from the same shared rules the server uses, so the walk-around starts
// with no signal; the create goes to the server through the sync engine, keyed by its client id.
export async function createLocalInspection({ vehicles, kind, locale }: NewWalkaround): Promise<LocalInspection> {
  const checklist = buildChecklist(
    vehicles.map((v) => ({ unitNumber: v.unitNumber, kind: v.kind, config: v.config })),
    kind,
    locale,
  );
  const clientId = crypto.randomUUID();
  return getOfflineRuntime().store.saveInspection({
    request: { clientId, vehicleIds: vehicles.map((v) => v.id), kind, locale, startedAt: new Date().toISOString() },
    vehicles: vehicles.map((v) => ({ id: v.id, unitNumber: v.unitNumber, kind: v.kind })),
    checklist,
  });
}

export function useCreateLocalInspection() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLocalInspection,
    networkMode: 'always',
    onSuccess: async (inspection) => {
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.local(inspection.clientId) });
    },
  });
}
