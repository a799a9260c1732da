import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  chooseNoteMimeType,
  NOTE_AUDIO_BITS_PER_SECOND,
  RecorderUnavailableError,
  rmsLevel,
  SILENCE_STOP_MS,
  startRecording,
  type RecorderEnvironment,
} from './record-note';

class FakeMediaRecorder extends EventTarget {
  static supported = new Set<string>();
  static instances: FakeMediaRecorder[] = [];
  static failToConstruct = false;
  static isTypeSupported(mimeType: string): boolean {
    return FakeMediaRecorder.supported.has(mimeType);
  }

  state: RecordingState = 'inactive';
  readonly mimeType: string;

  constructor(
    readonly stream: MediaStream,
    readonly options: MediaRecorderOptions = {},
  ) {
    super();
    if (FakeMediaRecorder.failToConstruct) throw new DOMException('Not supported', 'NotSupportedError');
    this.mimeType = options.mimeType ?? '';
    FakeMediaRecorder.instances.push(this);
  }

  start(): void {
    this.state = 'recording';
  }

  stop(): void {
    this.state = 'inactive';
    // As in the browser: the last data, then `stop`, after the call returns.
    queueMicrotask(() => {
      this.dispatchEvent(
        Object.assign(new Event('dataavailable'), { data: new Blob(['opus-frames'], { type: this.mimeType }) }),
      );
      this.dispatchEvent(new Event('stop'));
    });
  }
}

function fakeStream() {
  const track = { stop: vi.fn(), kind: 'audio' };
  return { stream: { getTracks: () => [track] } as unknown as MediaStream, track };
}

function fakeAudio() {
  const level = { rms: 0.2 };
  const context = {
    createMediaStreamSource: vi.fn(() => ({ connect: vi.fn(), disconnect: vi.fn() })),
    createAnalyser: vi.fn(() => ({
      fftSize: 0,
      // A steady signal whose RMS is the chosen level.
      getFloatTimeDomainData: (samples: Float32Array) => samples.fill(level.rms),
    })),
    close: vi.fn(() => Promise.resolve()),
  };
  return { level, context };
}

function environmentWith(stream: MediaStream, audio = fakeAudio()) {
  const getUserMedia = vi.fn(() => Promise.resolve(stream));
  const environment: RecorderEnvironment = {
    getUserMedia,
    MediaRecorder: FakeMediaRecorder as unknown as RecorderEnvironment['MediaRecorder'],
    createAudioContext: () => audio.context,
    now: () => Date.now(),
  };
  return { environment, getUserMedia, audio };
}

beforeEach(() => {
  vi.useFakeTimers();
  FakeMediaRecorder.supported = new Set(['audio/webm;codecs=opus', 'audio/ogg;codecs=opus', 'audio/mp4']);
  FakeMediaRecorder.instances = [];
  FakeMediaRecorder.failToConstruct = false;
});

afterEach(() => {
  vi.useRealTimers();
});

describe('chooseNoteMimeType', () => {
  it('prefers Opus in WebM, then Opus in Ogg, then MP4 as Safari records', () => {
    expect(chooseNoteMimeType(() => true)).toBe('audio/webm;codecs=opus');
    expect(chooseNoteMimeType((type) => type.startsWith('audio/ogg'))).toBe('audio/ogg;codecs=opus');
    expect(chooseNoteMimeType((type) => type === 'audio/mp4')).toBe('audio/mp4');
    expect(chooseNoteMimeType(() => false)).toBeUndefined();
  });
});

describe('rmsLevel', () => {
  it('measures the root mean square of the samples', () => {
    expect(rmsLevel(new Float32Array([0.5, -0.5, 0.5, -0.5]))).toBeCloseTo(0.5);
    expect(rmsLevel(new Float32Array([0, 0, 0]))).toBe(0);
    expect(rmsLevel(new Float32Array([]))).toBe(0);
  });
});

describe('startRecording', () => {
  it('opens the microphone without automatic gain and records Opus in WebM at 24 kbps', async () => {
    const { stream } = fakeStream();
    const { environment, getUserMedia } = environmentWith(stream);
    const recording = await startRecording({ maxMs: 60_000, environment });

    expect(getUserMedia).toHaveBeenCalledWith({
      audio: { echoCancellation: true, noiseSuppression: true, autoGainControl: false },
    });
    expect(FakeMediaRecorder.instances[0]?.options).toEqual({
      mimeType: 'audio/webm;codecs=opus',
      audioBitsPerSecond: NOTE_AUDIO_BITS_PER_SECOND,
    });
    // Our choice within the 8–40 kbps RFC 7587 recommends for Opus speech.
    expect(NOTE_AUDIO_BITS_PER_SECOND).toBe(24_000);
    expect(recording.mimeType).toBe('audio/webm;codecs=opus');
    await recording.stop();
  });

  it('falls back to MP4 where only MP4 records, and to the browser default where none is listed', async () => {
    FakeMediaRecorder.supported = new Set(['audio/mp4']);
    const first = await startRecording({ maxMs: 1000, environment: environmentWith(fakeStream().stream).environment });
    expect(FakeMediaRecorder.instances[0]?.options.mimeType).toBe('audio/mp4');
    await first.stop();

    FakeMediaRecorder.supported = new Set();
    const second = await startRecording({ maxMs: 1000, environment: environmentWith(fakeStream().stream).environment });
    expect(FakeMediaRecorder.instances[1]?.options).toEqual({ audioBitsPerSecond: 24_000 });
    await second.stop();
  });

  it('stops on call with the recorded audio and its duration, and releases the microphone', async () => {
    const { stream, track } = fakeStream();
    const { environment, audio } = environmentWith(stream);
    const recording = await startRecording({ maxMs: 60_000, environment });
    await vi.advanceTimersByTimeAsync(2500);
    expect(track.stop).not.toHaveBeenCalled();

    const note = await recording.stop();
    expect(note).toMatchObject({ mimeType: 'audio/webm;codecs=opus', durationMs: 2500, stoppedBy: 'call' });
    expect(note.blob.type).toBe('audio/webm;codecs=opus');
    expect(await note.blob.text()).toBe('opus-frames');
    expect(track.stop).toHaveBeenCalledTimes(1);
    expect(audio.context.close).toHaveBeenCalledTimes(1);
    await expect(recording.finished).resolves.toBe(note);
  });

  it('stops by itself at the maximum length while the driver keeps talking', async () => {
    const { environment } = environmentWith(fakeStream().stream);
    const recording = await startRecording({ maxMs: 30_000, environment });
    await vi.advanceTimersByTimeAsync(29_900);
    expect(FakeMediaRecorder.instances[0]?.state).toBe('recording');
    await vi.advanceTimersByTimeAsync(100);
    await expect(recording.finished).resolves.toMatchObject({ stoppedBy: 'max_duration', durationMs: 30_000 });
  });

  it('stops after 4 s of silence but not during a shorter pause', async () => {
    const { stream, track } = fakeStream();
    const { environment, audio } = environmentWith(stream);
    const recording = await startRecording({ maxMs: 120_000, environment });
    // Our own practice, not a published value.
    expect(SILENCE_STOP_MS).toBe(4000);

    await vi.advanceTimersByTimeAsync(2000);
    audio.level.rms = 0.002;
    await vi.advanceTimersByTimeAsync(3000);
    // A pause to think: speech again before the 4 s are up.
    audio.level.rms = 0.1;
    await vi.advanceTimersByTimeAsync(1000);
    audio.level.rms = 0.002;
    await vi.advanceTimersByTimeAsync(3800);
    expect(FakeMediaRecorder.instances[0]?.state).toBe('recording');

    await vi.advanceTimersByTimeAsync(300);
    const note = await recording.finished;
    expect(note.stoppedBy).toBe('silence');
    expect(note.durationMs).toBeGreaterThanOrEqual(10_000);
    expect(note.durationMs).toBeLessThanOrEqual(10_100);
    expect(track.stop).toHaveBeenCalledTimes(1);
  });

  it('leaves the tracks of a stream the caller passed in running', async () => {
    const { stream, track } = fakeStream();
    const { environment, getUserMedia } = environmentWith(stream);
    const recording = await startRecording({ stream, maxMs: 10_000, environment });
    await recording.stop();
    expect(getUserMedia).not.toHaveBeenCalled();
    expect(track.stop).not.toHaveBeenCalled();
  });

  it('releases the microphone when the recorder cannot be made', async () => {
    FakeMediaRecorder.failToConstruct = true;
    const { stream, track } = fakeStream();
    const { environment } = environmentWith(stream);
    await expect(startRecording({ maxMs: 10_000, environment })).rejects.toThrow('Not supported');
    expect(track.stop).toHaveBeenCalledTimes(1);
  });

  it('still records without a level check where no audio context is available', async () => {
    const { stream } = fakeStream();
    const { environment } = environmentWith(stream);
    const recording = await startRecording({
      maxMs: 5000,
      environment: { ...environment, createAudioContext: undefined },
    });
    await vi.advanceTimersByTimeAsync(5000);
    await expect(recording.finished).resolves.toMatchObject({ stoppedBy: 'max_duration' });
  });

  it('says plainly when the browser cannot record at all', async () => {
    // jsdom has neither MediaRecorder nor a microphone, like a page served without HTTPS.
    await expect(startRecording({ maxMs: 1000 })).rejects.toBeInstanceOf(RecorderUnavailableError);
  });
});
