import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const noteAudioKeys = {
  all: ['note-audio'] as const,
  detail: (noteId: string) => [...noteAudioKeys.all, noteId] as const,
};

// A voice note's audio (the token guards it, which an <audio src> cannot carry: a Blob).
export function getNoteAudio(noteId: string, signal?: AbortSignal): Promise<Blob> {
  return api.getBlob(`/notes/${encodeURIComponent(noteId)}/audio`, { accept: 'audio/*', signal });
}

export function noteAudioQueryOptions(noteId: string) {
  return queryOptions({
    queryKey: noteAudioKeys.detail(noteId),
    queryFn: ({ signal }) => getNoteAudio(noteId, signal),
    // A stored note never changes.
    staleTime: Infinity,
  });
}

export function useNoteAudio(noteId: string, enabled = true) {
  return useQuery({ ...noteAudioQueryOptions(noteId), enabled });
}
