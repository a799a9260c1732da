import type { EnsureQueryDataOptions, QueryClient, QueryKey } from '@tanstack/react-query';

// A route loader that has a screen's query in the cache before it shows (kept data is used as it is).
export function ensuringLoader<Data, Key extends QueryKey>(
  queryClient: QueryClient,
  query: EnsureQueryDataOptions<Data, Error, Data, Key>,
) {
  return async () => {
    await queryClient.ensureQueryData(query);
    return null;
  };
}
