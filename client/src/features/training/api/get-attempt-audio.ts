import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { trainingKeys } from './training-keys';

// The attempt's recording (the token guards it, which an <audio> source cannot carry: a Blob).
export function getAttemptAudio(attemptId: string, signal?: AbortSignal): Promise<Blob> {
  return api.getBlob(`/training/attempts/${encodeURIComponent(attemptId)}/audio`, { accept: 'audio/*', signal });
}

export function attemptAudioQueryOptions(attemptId: string) {
  return queryOptions({
    queryKey: trainingKeys.audio(attemptId),
    queryFn: ({ signal }) => getAttemptAudio(attemptId, signal),
    // A stored recording never changes.
    staleTime: Number.POSITIVE_INFINITY,
  });
}

export function useAttemptAudio(attemptId: string, enabled: boolean) {
  return useQuery({ ...attemptAudioQueryOptions(attemptId), enabled });
}
