import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreateTrainingAttemptRequest,
  FinishTrainingAttemptRequest,
  PutTrainingReviewRequest,
  PutTrainingSegmentsResponse,
  TrainingAttemptListItem,
  TrainingAttemptResponse,
  TrainingProgress,
  TrainingSegmentUpsert,
} from '@yardcall/shared';
import { api } from '../api-client';

export interface AttemptFilters {
  // Trainers: one student's attempts.
  studentId?: string;
  // Finished and not reviewed yet, or reviewed.
  review?: 'waiting' | 'reviewed';
}

// One key factory for practice attempts, their recordings, reviews and progress. The units a
// student practises on are the vehicles' list (vehicles.ts).
export const trainingKeys = {
  all: ['training'] as const,
  lists: () => [...trainingKeys.all, 'list'] as const,
  list: (filters: AttemptFilters) =>
    [...trainingKeys.lists(), { studentId: filters.studentId ?? null, review: filters.review ?? null }] as const,
  details: () => [...trainingKeys.all, 'detail'] as const,
  detail: (attemptId: string) => [...trainingKeys.details(), attemptId] as const,
  audio: (attemptId: string) => [...trainingKeys.detail(attemptId), 'audio'] as const,
  progresses: () => [...trainingKeys.all, 'progress'] as const,
  // 'me' for the signed-in student.
  progress: (studentId: string) => [...trainingKeys.progresses(), studentId] as const,
};

const attemptPath = (attemptId: string) => `/training/attempts/${encodeURIComponent(attemptId)}`;

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

export function getAttempt(attemptId: string, signal?: AbortSignal): Promise<TrainingAttemptResponse> {
  return api.get<TrainingAttemptResponse>(attemptPath(attemptId), { signal });
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

// The attempt's recording (the token guards it, which an <audio> source cannot carry: a Blob).
export function getAttemptAudio(attemptId: string, signal?: AbortSignal): Promise<Blob> {
  return api.getBlob(`${attemptPath(attemptId)}/audio`, { accept: 'audio/*', signal });
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

// Idempotent on clientId: a retried create answers the same attempt.
export function createAttempt(body: CreateTrainingAttemptRequest): Promise<TrainingAttemptResponse> {
  return api.post<TrainingAttemptResponse>('/training/attempts', body);
}

export function useCreateAttempt() {
  return useMutation({ mutationFn: createAttempt });
}

// Segments are merged by seq on the server: sending a batch again changes nothing.
export function putSegments(
  attemptId: string,
  segments: TrainingSegmentUpsert[],
): Promise<PutTrainingSegmentsResponse> {
  return api.put<PutTrainingSegmentsResponse>(`${attemptPath(attemptId)}/segments`, { segments });
}

export interface PracticeRecording {
  blob: Blob;
  mimeType: string;
  durationMs: number;
}

function extensionOf(mimeType: string): string {
  if (mimeType.includes('ogg')) return 'ogg';
  if (mimeType.includes('mp4')) return 'm4a';
  return 'webm';
}

// The server judges the file by its content; the name only helps a person reading the upload.
export function uploadAudio(attemptId: string, recording: PracticeRecording): Promise<TrainingAttemptResponse> {
  const form = new FormData();
  form.append('durationMs', String(Math.round(recording.durationMs)));
  form.append('file', recording.blob, `practice.${extensionOf(recording.mimeType)}`);
  return api.post<TrainingAttemptResponse>(`${attemptPath(attemptId)}/audio`, form);
}

export function useUploadAudio() {
  return useMutation({
    mutationFn: ({ attemptId, recording }: { attemptId: string; recording: PracticeRecording }) =>
      uploadAudio(attemptId, recording),
  });
}

// A finished or reviewed attempt is its own detail at once; the lists and progress ask again.
function useSaveAttempt<Variables>(save: (variables: Variables) => Promise<TrainingAttemptResponse>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: save,
    onSuccess: (attempt) => {
      queryClient.setQueryData(trainingKeys.detail(attempt.id), attempt);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: trainingKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: trainingKeys.progresses() }),
      ]);
    },
  });
}

// The server scores the narration; finishing again answers the stored attempt.
export function finishAttempt(attemptId: string, body: FinishTrainingAttemptRequest): Promise<TrainingAttemptResponse> {
  return api.post<TrainingAttemptResponse>(`${attemptPath(attemptId)}/finish`, body);
}

export function useFinishAttempt() {
  return useSaveAttempt(({ attemptId, body }: { attemptId: string; body: FinishTrainingAttemptRequest }) =>
    finishAttempt(attemptId, body),
  );
}

export function putReview(attemptId: string, body: PutTrainingReviewRequest): Promise<TrainingAttemptResponse> {
  return api.put<TrainingAttemptResponse>(`${attemptPath(attemptId)}/review`, body);
}

export function usePutReview() {
  return useSaveAttempt(({ attemptId, body }: { attemptId: string; body: PutTrainingReviewRequest }) =>
    putReview(attemptId, body),
  );
}
