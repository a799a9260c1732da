import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMail } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

export function getOutbox(signal?: AbortSignal): Promise<CaughtMail[]> {
  return api.get<CaughtMail[]>('/mail/outbox', { signal });
}

export function outboxQueryOptions() {
  return queryOptions({
    queryKey: userKeys.outbox(),
    queryFn: ({ signal }) => getOutbox(signal),
    // The demo checks its mail often: always ask again when the screen opens.
    staleTime: 0,
  });
}

export function useOutbox() {
  return useQuery(outboxQueryOptions());
}
