import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TrainingAttemptResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { trainingKeys } from './training-keys';

export function getAttempt(attemptId: string, signal?: AbortSignal): Promise<TrainingAttemptResponse> {
  return api.get<TrainingAttemptResponse>(`/training/attempts/${encodeURIComponent(attemptId)}`, { signal });
}

export function attemptQueryOptions(attemptId: string) {
  return queryOptions({
    queryKey: trainingKeys.detail(attemptId),
    queryFn: ({ signal }) => getAttempt(attemptId, signal),
  });
}

export function useAttempt(attemptId: string) {
  return useQuery(attemptQueryOptions(attemptId));
}
