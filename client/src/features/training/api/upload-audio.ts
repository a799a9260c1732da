import { useMutation } from '@tanstack/react-query';
import type { TrainingAttemptResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';

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
  return api.post<TrainingAttemptResponse>(`/training/attempts/${encodeURIComponent(attemptId)}/audio`, form);
}

export function useUploadAudio() {
  return useMutation({
    mutationFn: ({ attemptId, recording }: { attemptId: string; recording: PracticeRecording }) =>
      uploadAudio(attemptId, recording),
  });
}
