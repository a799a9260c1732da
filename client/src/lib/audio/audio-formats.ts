// What ffmpeg is asked to make, and which type a browser is offered. Pure: no ffmpeg, no DOM.

export interface AudioFormat {
  id: 'wav' | 'ogg' | 'webm' | 'mp3';
  mimeType: string;
  // What `audio.canPlayType` is asked (codecs named where the container allows several).
  probeType: string;
  extension: string;
  codecArgs: string[];
}

export const AUDIO_FORMATS: Record<AudioFormat['id'], AudioFormat> = {
  wav: { id: 'wav', mimeType: 'audio/wav', probeType: 'audio/wav', extension: 'wav', codecArgs: ['-c:a', 'pcm_s16le'] },
  // Vorbis, not Opus: libopus in @ffmpeg/core 0.12.10 fails with "memory access out of bounds"
  // (seen here in Chromium; reported upstream as ffmpeg.wasm issue 591).
  ogg: {
    id: 'ogg',
    mimeType: 'audio/ogg',
    probeType: 'audio/ogg; codecs="vorbis"',
    extension: 'ogg',
    codecArgs: ['-c:a', 'libvorbis', '-q:a', '4'],
  },
  webm: {
    id: 'webm',
    mimeType: 'audio/webm',
    probeType: 'audio/webm; codecs="vorbis"',
    extension: 'webm',
    codecArgs: ['-c:a', 'libvorbis', '-q:a', '4'],
  },
  mp3: {
    id: 'mp3',
    mimeType: 'audio/mpeg',
    probeType: 'audio/mpeg',
    extension: 'mp3',
    codecArgs: ['-c:a', 'libmp3lame', '-q:a', '4'],
  },
};

// Formats a reviewer can download a clip as, in the order offered.
export const CLIP_FORMATS: readonly AudioFormat['id'][] = ['webm', 'ogg', 'wav'];

// Conversion targets for playback: WAV decodes everywhere and fastest; the others are smaller.
const PLAYBACK_PREFERENCE: readonly AudioFormat['id'][] = ['wav', 'ogg', 'mp3', 'webm'];

export type CanPlayType = (type: string) => string;

// The stored note's base type without parameters ("audio/webm;codecs=opus" -> "audio/webm").
export function baseMimeType(mimeType: string): string {
  return mimeType.split(';')[0]?.trim().toLowerCase() ?? '';
}

// `canPlayType` answers '' (no), 'maybe' or 'probably': only '' means the browser cannot.
export function needsConversion(mimeType: string, canPlayType: CanPlayType): boolean {
  return canPlayType(mimeType) === '' && canPlayType(baseMimeType(mimeType)) === '';
}

// The first format this browser says it can play, or null when it claims none.
export function choosePlaybackFormat(canPlayType: CanPlayType): AudioFormat | null {
  for (const id of PLAYBACK_PREFERENCE) {
    const format = AUDIO_FORMATS[id];
    if (canPlayType(format.probeType) !== '') return format;
  }
  return null;
}

// The file name ffmpeg's in-memory file system gets for the note, so it can tell the container.
export function inputFileName(mimeType: string): string {
  switch (baseMimeType(mimeType)) {
    case 'audio/webm':
      return 'input.webm';
    case 'audio/ogg':
      return 'input.ogg';
    case 'audio/mp4':
    case 'audio/m4a':
    case 'audio/x-m4a':
      return 'input.m4a';
    case 'audio/mpeg':
      return 'input.mp3';
    case 'audio/wav':
    case 'audio/x-wav':
    case 'audio/wave':
      return 'input.wav';
    default:
      return 'input.bin';
  }
}

export function outputFileName(format: AudioFormat, stem = 'output'): string {
  return `${stem}.${format.extension}`;
}

// Re-encode the whole note into a format the browser plays.
export function buildConvertArgs(input: string, output: string, format: AudioFormat): string[] {
  return ['-i', input, '-vn', ...format.codecArgs, output];
}

// Cut [start, end) out of the note. -ss/-to after -i decode from the start: exact to the sample,
// and a voice note is short enough that the cost does not matter.
export function buildTrimArgs(
  input: string,
  output: string,
  startSeconds: number,
  endSeconds: number,
  format: AudioFormat,
): string[] {
  if (!(endSeconds > startSeconds) || startSeconds < 0) {
    throw new RangeError(`A clip must end after it starts (start ${startSeconds}, end ${endSeconds}).`);
  }
  return [
    '-i',
    input,
    '-ss',
    startSeconds.toFixed(3),
    '-to',
    endSeconds.toFixed(3),
    '-vn',
    ...format.codecArgs,
    output,
  ];
}

// One ffmpeg run over a note, all but the bytes: what the runner's job needs besides its input.
export interface TranscodePlan {
  inputName: string;
  outputName: string;
  outputType: string;
  args: string[];
}

function plan(mimeType: string, format: AudioFormat, stem: string, args: (input: string, output: string) => string[]) {
  const inputName = inputFileName(mimeType);
  const outputName = outputFileName(format, stem);
  return { inputName, outputName, outputType: format.mimeType, args: args(inputName, outputName) };
}

// The whole note as a copy this browser plays.
export function conversionPlan(mimeType: string, format: AudioFormat): TranscodePlan {
  return plan(mimeType, format, 'playable', (input, output) => buildConvertArgs(input, output, format));
}

// [start, end) of the note as a file to download.
export function clipPlan(
  mimeType: string,
  startSeconds: number,
  endSeconds: number,
  format: AudioFormat,
): TranscodePlan {
  return plan(mimeType, format, 'clip', (input, output) =>
    buildTrimArgs(input, output, startSeconds, endSeconds, format),
  );
}

// The recording as it was stored: "note-3a9f0c12.webm".
export function originalFileName(noteId: string, mimeType: string): string {
  return `note-${noteId.slice(0, 8)}.${inputFileName(mimeType).split('.')[1] ?? 'bin'}`;
}

// "note-3a9f…-clip-0m04.2s-0m07.8s.webm": tells what the file is once it sits in Downloads.
export function clipFileName(noteId: string, startSeconds: number, endSeconds: number, format: AudioFormat): string {
  const stamp = (seconds: number) => {
    const minutes = Math.floor(seconds / 60);
    return `${minutes}m${(seconds - minutes * 60).toFixed(1).padStart(4, '0')}s`;
  };
  return `note-${noteId.slice(0, 8)}-clip-${stamp(startSeconds)}-${stamp(endSeconds)}.${format.extension}`;
}
