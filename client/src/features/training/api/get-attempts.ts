import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TrainingAttemptListItem } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { trainingKeys, type AttemptFilters } from './training-keys';

export function getAttempts(filters: AttemptFilters, signal?: AbortSignal): Promise<TrainingAttemptListItem[]> {
  return api.get<TrainingAttemptListItem[]>('/training/attempts', {
    query: { studentId: filters.studentId, review: filters.review },
    signal,
  });
}

export function attemptsQueryOptions(filters: AttemptFilters = {}) {
  return queryOptions({
    queryKey: trainingKeys.list(filters),
    queryFn: ({ signal }) => getAttempts(filters, signal),
  });
}

export function useAttempts(filters: AttemptFilters = {}) {
  return useQuery(attemptsQueryOptions(filters));
}
