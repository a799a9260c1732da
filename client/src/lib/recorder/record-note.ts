// Voice notes: records the microphone with MediaRecorder until a call, a maximum length or a long silence.

// Opus speech at 16–32 kbps (RFC 7587 recommends 8–40 kbps); 24 kbps is about 180 KB a minute.
export const NOTE_AUDIO_BITS_PER_SECOND = 24_000;

// Best first: Opus in WebM (Chromium), Opus in Ogg, then MP4, which is what Safari records.
export const NOTE_MIME_PREFERENCE = ['audio/webm;codecs=opus', 'audio/ogg;codecs=opus', 'audio/mp4'] as const;

// Our own practice: a level below this RMS (full scale 1.0) counts as silence in a yard.
export const SILENCE_RMS_THRESHOLD = 0.01;
// Our own practice: this long under the threshold ends the note.
export const SILENCE_STOP_MS = 4000;
// Our own practice: how often the level is sampled.
export const LEVEL_CHECK_INTERVAL_MS = 100;

// Echo cancellation and noise suppression help in a loud yard; automatic gain would lift the yard
// noise during pauses and hide the silence that ends a note.
export const NOTE_AUDIO_CONSTRAINTS: MediaTrackConstraints = {
  echoCancellation: true,
  noiseSuppression: true,
  autoGainControl: false,
};

export type StopReason = 'call' | 'max_duration' | 'silence';

export interface RecordedNote {
  blob: Blob;
  mimeType: string;
  durationMs: number;
  stoppedBy: StopReason;
}

type AnalyserLike = Pick<AnalyserNode, 'fftSize' | 'getFloatTimeDomainData'>;

interface AudioContextLike {
  createMediaStreamSource(stream: MediaStream): Pick<MediaStreamAudioSourceNode, 'connect' | 'disconnect'>;
  createAnalyser(): AnalyserLike;
  close(): Promise<void>;
}

interface MediaRecorderConstructor {
  new (stream: MediaStream, options?: MediaRecorderOptions): MediaRecorder;
  isTypeSupported(mimeType: string): boolean;
}

// The browser pieces a recording uses, so tests can stand in for them.
export interface RecorderEnvironment {
  getUserMedia(constraints: MediaStreamConstraints): Promise<MediaStream>;
  MediaRecorder: MediaRecorderConstructor;
  // Absent: no silence detection, the note stops by call or maximum only.
  createAudioContext?: () => AudioContextLike;
  now(): number;
}

export interface StartRecordingOptions {
  // A stream the caller already holds (and keeps: its tracks are left running).
  stream?: MediaStream;
  maxMs: number;
  silenceMs?: number;
  silenceRms?: number;
  environment?: RecorderEnvironment;
}

export interface NoteRecording {
  // Resolves with the note however it ended.
  readonly finished: Promise<RecordedNote>;
  stop(): Promise<RecordedNote>;
  readonly mimeType: string;
}

export class RecorderUnavailableError extends Error {
  constructor() {
    super('This browser cannot record voice notes here. Type the note instead.');
    this.name = 'RecorderUnavailableError';
  }
}

function browserEnvironment(): RecorderEnvironment {
  const AudioContextClass = globalThis.AudioContext as (new () => AudioContext) | undefined;
  // Both are missing on a page not served over HTTPS and in older browsers.
  if (typeof globalThis.MediaRecorder === 'undefined' || !globalThis.navigator?.mediaDevices?.getUserMedia) {
    throw new RecorderUnavailableError();
  }
  return {
    getUserMedia: (constraints) => navigator.mediaDevices.getUserMedia(constraints),
    MediaRecorder: globalThis.MediaRecorder,
    createAudioContext: AudioContextClass ? () => new AudioContextClass() : undefined,
    now: () => performance.now(),
  };
}

export function chooseNoteMimeType(isTypeSupported: (mimeType: string) => boolean): string | undefined {
  return NOTE_MIME_PREFERENCE.find((mimeType) => isTypeSupported(mimeType));
}

export function rmsLevel(samples: Float32Array): number {
  if (samples.length === 0) return 0;
  let sum = 0;
  for (const sample of samples) sum += sample * sample;
  return Math.sqrt(sum / samples.length);
}

export async function startRecording(options: StartRecordingOptions): Promise<NoteRecording> {
  const environment = options.environment ?? browserEnvironment();
  const silenceMs = options.silenceMs ?? SILENCE_STOP_MS;
  const silenceRms = options.silenceRms ?? SILENCE_RMS_THRESHOLD;
  const ownsStream = !options.stream;
  const stream = options.stream ?? (await environment.getUserMedia({ audio: NOTE_AUDIO_CONSTRAINTS }));

  const releaseStream = () => {
    if (ownsStream) for (const track of stream.getTracks()) track.stop();
  };

  let recorder: MediaRecorder;
  const chosen = chooseNoteMimeType((type) => environment.MediaRecorder.isTypeSupported(type));
  try {
    recorder = new environment.MediaRecorder(stream, {
      ...(chosen ? { mimeType: chosen } : {}),
      audioBitsPerSecond: NOTE_AUDIO_BITS_PER_SECOND,
    });
  } catch (error) {
    releaseStream();
    throw error;
  }

  const chunks: Blob[] = [];
  let startedAt = environment.now();
  let stoppedBy: StopReason = 'call';
  let audioContext: AudioContextLike | undefined;
  let levelTimer: ReturnType<typeof setInterval> | undefined;
  let maxTimer: ReturnType<typeof setTimeout> | undefined = undefined;

  const cleanUp = () => {
    clearInterval(levelTimer);
    clearTimeout(maxTimer);
    void audioContext?.close().catch(() => undefined);
    audioContext = undefined;
    releaseStream();
  };

  const finished = new Promise<RecordedNote>((resolve, reject) => {
    recorder.addEventListener('dataavailable', (event: BlobEvent) => {
      if (event.data.size > 0) chunks.push(event.data);
    });
    recorder.addEventListener('stop', () => {
      const durationMs = Math.max(0, Math.round(environment.now() - startedAt));
      const mimeType = recorder.mimeType || chosen || chunks[0]?.type || '';
      cleanUp();
      resolve({ blob: new Blob(chunks, { type: mimeType }), mimeType, durationMs, stoppedBy });
    });
    recorder.addEventListener('error', (event) => {
      cleanUp();
      reject(
        event instanceof ErrorEvent && event.error instanceof Error ? event.error : new Error('Recording failed.'),
      );
    });
  });

  const stopBy = (reason: StopReason): Promise<RecordedNote> => {
    if (recorder.state !== 'inactive') {
      stoppedBy = reason;
      recorder.stop();
    }
    return finished;
  };

  try {
    recorder.start();
  } catch (error) {
    cleanUp();
    throw error;
  }
  startedAt = environment.now();
  maxTimer = setTimeout(() => void stopBy('max_duration'), options.maxMs);

  if (environment.createAudioContext) {
    try {
      audioContext = environment.createAudioContext();
      const analyser = audioContext.createAnalyser();
      analyser.fftSize = 2048;
      audioContext.createMediaStreamSource(stream).connect(analyser as AnalyserNode);
      const samples = new Float32Array(analyser.fftSize);
      // Silence from the start counts too: a note with nothing said ends after silenceMs.
      let quietSince = environment.now();
      levelTimer = setInterval(() => {
        analyser.getFloatTimeDomainData(samples);
        const now = environment.now();
        if (rmsLevel(samples) >= silenceRms) quietSince = now;
        else if (now - quietSince >= silenceMs) void stopBy('silence');
      }, LEVEL_CHECK_INTERVAL_MS);
    } catch {
      // No level check (an audio context refused): the note still stops by call or maximum.
    }
  }

  return { finished, stop: () => stopBy('call'), mimeType: recorder.mimeType || chosen || '' };
}
