import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FinishTrainingAttemptRequest, TrainingAttemptResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { trainingKeys } from './training-keys';

// The server scores the narration; finishing again answers the stored attempt.
export function finishAttempt(attemptId: string, body: FinishTrainingAttemptRequest): Promise<TrainingAttemptResponse> {
  return api.post<TrainingAttemptResponse>(`/training/attempts/${encodeURIComponent(attemptId)}/finish`, body);
}

export function useFinishAttempt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ attemptId, body }: { attemptId: string; body: FinishTrainingAttemptRequest }) =>
      finishAttempt(attemptId, body),
    onSuccess: (attempt) => {
      queryClient.setQueryData(trainingKeys.detail(attempt.id), attempt);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: trainingKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: trainingKeys.progresses() }),
      ]);
    },
  });
}
