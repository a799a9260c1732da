import { NOTE_AUDIO_TYPES, NOTE_MAX_BYTES, PHOTO_MAX_BYTES, PHOTO_TYPES } from '@yardcall/shared';
import { fileTypeFromBuffer } from 'file-type';

export type NoteAudioType = (typeof NOTE_AUDIO_TYPES)[number];
export type PhotoType = (typeof PHOTO_TYPES)[number];

// What file-type reports (by extension) for each type we keep; WebM and MP4 containers are
// reported as video even when they hold only audio, so the container decides.
const AUDIO_BY_EXTENSION: Record<string, NoteAudioType> = {
  webm: 'audio/webm',
  opus: 'audio/ogg',
  ogg: 'audio/ogg',
  oga: 'audio/ogg',
  mp4: 'audio/mp4',
  m4a: 'audio/mp4',
  m4b: 'audio/mp4',
  f4a: 'audio/mp4',
  mp3: 'audio/mpeg',
  wav: 'audio/wav',
};

const PHOTO_BY_EXTENSION: Record<string, PhotoType> = {
  jpg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
};

export interface MediaKind<T extends string> {
  // Said in messages: "a voice note", "a photo".
  label: string;
  accepted: Record<string, T>;
  // Said in messages: the containers we take.
  acceptedNames: string;
  maxBytes: number;
}

export type Detection<T extends string> =
  | { ok: true; mimeType: T; extension: string }
  // found: what the content looks like (a MIME type), or null when nothing was recognised.
  | { ok: false; found: string | null };

// Judges a file by its bytes, never by the name or type the client sent.
export async function detectMedia<T extends string>(buffer: Buffer, kind: MediaKind<T>): Promise<Detection<T>> {
  const found = await fileTypeFromBuffer(buffer);
  if (!found) return { ok: false, found: null };
  const mimeType = kind.accepted[found.ext];
  return mimeType ? { ok: true, mimeType, extension: found.ext } : { ok: false, found: found.mime };
}

export const VOICE_NOTE_MEDIA: MediaKind<NoteAudioType> = {
  label: 'a voice note',
  accepted: AUDIO_BY_EXTENSION,
  acceptedNames: 'WebM, Ogg, MP4/M4A, MP3 or WAV audio',
  maxBytes: NOTE_MAX_BYTES,
};

export const PHOTO_MEDIA: MediaKind<PhotoType> = {
  label: 'a photo',
  accepted: PHOTO_BY_EXTENSION,
  acceptedNames: 'JPEG, PNG or WebP images',
  maxBytes: PHOTO_MAX_BYTES,
};
