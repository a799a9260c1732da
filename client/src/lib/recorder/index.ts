export {
  chooseNoteMimeType,
  LEVEL_CHECK_INTERVAL_MS,
  NOTE_AUDIO_BITS_PER_SECOND,
  NOTE_AUDIO_CONSTRAINTS,
  NOTE_MIME_PREFERENCE,
  RecorderUnavailableError,
  rmsLevel,
  SILENCE_RMS_THRESHOLD,
  SILENCE_STOP_MS,
  startRecording,
} from './record-note';
export type {
  NoteRecording,
  RecordedNote,
  RecorderEnvironment,
  StartRecordingOptions,
  StopReason,
} from './record-note';
export { fitWithinEdge, PHOTO_JPEG_QUALITY, PHOTO_MAX_EDGE_PX, resizePhoto } from './resize-photo';
export type { PhotoEnvironment, Size } from './resize-photo';
