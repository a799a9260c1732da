// ffmpeg.wasm, self-hosted. Only ever reached through a dynamic import (see use-ffmpeg-job.ts), so
// neither this module nor the 32 MB core enters any screen's first load.
import { FFmpeg } from '@ffmpeg/ffmpeg';
import coreURL from '@ffmpeg/core?url';
import wasmURL from '@ffmpeg/core/wasm?url';

export type FfmpegStage = 'loading' | 'working';

export interface FfmpegProgress {
  stage: FfmpegStage;
  // 0..1, or null while the size is not known (a compressed response hides it).
  fraction: number | null;
}

export type ProgressListener = (progress: FfmpegProgress) => void;

export class FfmpegLoadError extends Error {
  constructor(cause: unknown) {
    super(cause instanceof Error ? cause.message : String(cause));
    this.name = 'FfmpegLoadError';
  }
}

export class FfmpegJobError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'FfmpegJobError';
  }
}

// The wasm is already downloaded by then: compiling it takes well under this.
const LOAD_TIMEOUT_MS = 60_000;

let instance: Promise<FFmpeg> | null = null;
let loadListener: ProgressListener | null = null;
// One job at a time: the core keeps one in-memory file system.
let queue: Promise<unknown> = Promise.resolve();

// The wasm is fetched here first only to show the download's progress; the bytes are dropped and
// the core fetches the same URL again from the HTTP cache. (A blob: URL would need connect-src blob:.)
async function prefetchWasm(): Promise<void> {
  const response = await fetch(wasmURL);
  if (!response.ok || !response.body) throw new Error(`The converter could not be downloaded (${response.status}).`);
  // With Content-Encoding the length counts compressed bytes: no honest fraction then.
  const encoded = response.headers.get('Content-Encoding');
  const total = encoded ? NaN : Number(response.headers.get('Content-Length'));
  const reader = response.body.getReader();
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    received += value.length;
    loadListener?.({ stage: 'loading', fraction: total > 0 ? Math.min(received / total, 1) : null });
  }
}

async function createFfmpeg(): Promise<FFmpeg> {
  try {
    await prefetchWasm();
    const ffmpeg = new FFmpeg();
    // A core that cannot start (blocked WebAssembly, a broken file) would otherwise wait forever.
    await ffmpeg.load({ coreURL, wasmURL }, { signal: AbortSignal.timeout(LOAD_TIMEOUT_MS) });
    return ffmpeg;
  } catch (cause) {
    throw new FfmpegLoadError(cause);
  }
}

export function loadFfmpeg(onProgress?: ProgressListener): Promise<FFmpeg> {
  loadListener = onProgress ?? null;
  instance ??= createFfmpeg().catch((error: unknown) => {
    // A failed load can be retried (the network may come back).
    instance = null;
    throw error;
  });
  return instance;
}

async function discardInstance(): Promise<void> {
  const current = instance;
  instance = null;
  if (!current) return;
  try {
    (await current).terminate();
  } catch {
    // It never loaded: nothing to stop.
  }
}

export interface TranscodeJob {
  input: Blob;
  inputName: string;
  outputName: string;
  outputType: string;
  args: string[];
}

// Run one ffmpeg command over an in-memory file and hand back the result as a Blob.
export function transcode(job: TranscodeJob, onProgress?: ProgressListener): Promise<Blob> {
  const run = async (): Promise<Blob> => {
    const ffmpeg = await loadFfmpeg(onProgress);
    onProgress?.({ stage: 'working', fraction: 0 });
    const report = ({ progress }: { progress: number }) => {
      // The core reports odd values (negative, > 1) for inputs without a known duration.
      onProgress?.({ stage: 'working', fraction: progress >= 0 && progress <= 1 ? progress : null });
    };
    ffmpeg.on('progress', report);
    try {
      await ffmpeg.writeFile(job.inputName, new Uint8Array(await job.input.arrayBuffer()));
      const code = await ffmpeg.exec(job.args);
      if (code !== 0) throw new FfmpegJobError(`The converter stopped with code ${code}.`);
      const data = await ffmpeg.readFile(job.outputName);
      if (typeof data === 'string' || data.length === 0) throw new FfmpegJobError('The converter made an empty file.');
      onProgress?.({ stage: 'working', fraction: 1 });
      return new Blob([new Uint8Array(data)], { type: job.outputType });
    } finally {
      ffmpeg.off('progress', report);
      await Promise.allSettled([ffmpeg.deleteFile(job.inputName), ffmpeg.deleteFile(job.outputName)]);
    }
  };
  const guarded = async (): Promise<Blob> => {
    try {
      return await run();
    } catch (error) {
      // A crash inside the core (not a plain non-zero exit) leaves it unusable: start afresh next time.
      if (!(error instanceof FfmpegJobError) && !(error instanceof FfmpegLoadError)) await discardInstance();
      throw error;
    }
  };
  const next = queue.then(guarded, guarded);
  queue = next.catch(() => undefined);
  return next;
}
