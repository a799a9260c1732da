import { queryOptions, useQuery } from '@tanstack/react-query';
import type { LocalInspection, LocalResult } from '@/lib/offline';
import { getOfflineRuntime } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

export interface LocalWalkaround {
  inspection: LocalInspection;
  results: LocalResult[];
}

// Read from this device's store, never the network: a walk-around opens with no signal.
export async function getLocalInspection(clientId: string): Promise<LocalWalkaround | null> {
  const { store } = getOfflineRuntime();
  const inspection = await store.getInspection(clientId);
  if (!inspection) return null;
  return { inspection, results: await store.getResults(clientId) };
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
