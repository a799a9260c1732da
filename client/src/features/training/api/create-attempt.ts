import { useMutation } from '@tanstack/react-query';
import type { CreateTrainingAttemptRequest, TrainingAttemptResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';

// Idempotent on clientId: a retried create answers the same attempt.
export function createAttempt(body: CreateTrainingAttemptRequest): Promise<TrainingAttemptResponse> {
  return api.post<TrainingAttemptResponse>('/training/attempts', body);
}

export function useCreateAttempt() {
  return useMutation({ mutationFn: createAttempt });
}
