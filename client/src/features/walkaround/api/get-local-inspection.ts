import { queryOptions, useQuery } from '@tanstack/react-query';
import { getOfflineRuntime, type LocalWalkaround } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

// Read from this device's store, never the network: a walk-around opens with no signal.
export function getLocalInspection(clientId: string): Promise<LocalWalkaround | null> {
  return getOfflineRuntime().store.getWalkaround(clientId);
}

export function localInspectionQueryOptions(clientId: string) {
  return queryOptions({
    queryKey: walkaroundKeys.local(clientId),
    queryFn: () => getLocalInspection(clientId),
    // The screen owns the live state once loaded; a refetch would only fight it.
    staleTime: Infinity,
    networkMode: 'always',
  });
}

export function useLocalInspection(clientId: string) {
  return useQuery(localInspectionQueryOptions(clientId));
}
