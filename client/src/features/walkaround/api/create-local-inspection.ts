import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InspectionKind, Locale, ReadingRule, VehicleResponse } from '@yardcall/shared';
import type { LocalInspection } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

export interface NewWalkaround {
  // Power unit first, then the trailer.
  vehicles: VehicleResponse[];
  kind: InspectionKind;
  locale: Locale;
  // The organisation's required readings (from the phone's copy when there is no signal).
  requiredReadings: ReadingRule[];
}

export async function createLocalInspection(walkaround: NewWalkaround): Promise<LocalInspection> {
  const { buildLocalInspection } = await import('./build-local-inspection');
  return buildLocalInspection(walkaround);
}

export function useCreateLocalInspection() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLocalInspection,
    networkMode: 'always',
    onSuccess: async (inspection) => {
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.local(inspection.clientId) });
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.localLists() });
    },
  });
}
