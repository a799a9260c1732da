import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMail } from '@yardcall/shared';
import { api } from '../api-client';

// The messages caught by the demo's local mail catcher (invitations, for one).
export const mailKeys = {
  all: ['mail'] as const,
  outbox: () => [...mailKeys.all, 'outbox'] as const,
};

export function getOutbox(signal?: AbortSignal): Promise<CaughtMail[]> {
  return api.get<CaughtMail[]>('/mail/outbox', { signal });
}

export function outboxQueryOptions() {
  return queryOptions({
    queryKey: mailKeys.outbox(),
    queryFn: ({ signal }) => getOutbox(signal),
    // The demo checks its mail often: always ask again when the screen opens.
    staleTime: 0,
  });
}

export function useOutbox() {
  return useQuery(outboxQueryOptions());
}
