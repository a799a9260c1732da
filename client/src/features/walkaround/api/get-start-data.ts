import { queryOptions, useQuery } from '@tanstack/react-query';
import { getStartData } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

// Asked whatever the network says: with no signal the phone's copy answers, with its age.
export function startDataQueryOptions() {
  return queryOptions({
    queryKey: walkaroundKeys.startData(),
    queryFn: ({ signal }) => getStartData(signal),
    networkMode: 'always',
    staleTime: 30_000,
  });
}

export function useStartData() {
  return useQuery(startDataQueryOptions());
}
