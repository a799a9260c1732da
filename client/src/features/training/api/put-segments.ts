import { useMutation } from '@tanstack/react-query';
import type { PutTrainingSegmentsResponse, TrainingSegmentUpsert } from '@yardcall/shared';
import { api } from '@/lib/api-client';

// Segments are merged by seq on the server: sending a batch again changes nothing.
export function putSegments(
  attemptId: string,
  segments: TrainingSegmentUpsert[],
): Promise<PutTrainingSegmentsResponse> {
  return api.put<PutTrainingSegmentsResponse>(`/training/attempts/${encodeURIComponent(attemptId)}/segments`, {
    segments,
  });
}

export function usePutSegments() {
  return useMutation({
    mutationFn: ({ attemptId, segments }: { attemptId: string; segments: TrainingSegmentUpsert[] }) =>
      putSegments(attemptId, segments),
  });
}
