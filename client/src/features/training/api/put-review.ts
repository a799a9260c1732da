import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PutTrainingReviewRequest, TrainingAttemptResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { trainingKeys } from './training-keys';

export function putReview(attemptId: string, body: PutTrainingReviewRequest): Promise<TrainingAttemptResponse> {
  return api.put<TrainingAttemptResponse>(`/training/attempts/${encodeURIComponent(attemptId)}/review`, body);
}

export function usePutReview() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ attemptId, body }: { attemptId: string; body: PutTrainingReviewRequest }) =>
      putReview(attemptId, body),
    onSuccess: (attempt) => {
      queryClient.setQueryData(trainingKeys.detail(attempt.id), attempt);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: trainingKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: trainingKeys.progresses() }),
      ]);
    },
  });
}
