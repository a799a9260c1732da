import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TrainingProgress } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { trainingKeys } from './training-keys';

// Without a student id: the signed-in student's own progress.
export function getProgress(studentId?: string, signal?: AbortSignal): Promise<TrainingProgress> {
  return api.get<TrainingProgress>('/training/progress', { query: { studentId }, signal });
}

export function progressQueryOptions(studentId?: string) {
  return queryOptions({
    queryKey: trainingKeys.progress(studentId ?? 'me'),
    queryFn: ({ signal }) => getProgress(studentId, signal),
  });
}

export function useProgress(studentId?: string) {
  return useQuery(progressQueryOptions(studentId));
}
