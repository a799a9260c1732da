import { useCallback, useRef, useState } from 'react';
import type { FfmpegProgress, TranscodeJob } from './ffmpeg-runner';

export type FfmpegJobState =
  | { status: 'idle' }
  | { status: 'running'; progress: FfmpegProgress }
  | { status: 'done' }
  | { status: 'error'; kind: 'load' | 'job'; message: string };

// Runs ffmpeg jobs for a component: the converter's code is fetched on the first job only.
export function useFfmpegJob() {
  const [state, setState] = useState<FfmpegJobState>({ status: 'idle' });
  const mounted = useRef(true);

  const run = useCallback(async (job: TranscodeJob): Promise<Blob | null> => {
    mounted.current = true;
    setState({ status: 'running', progress: { stage: 'loading', fraction: null } });
    let runner: typeof import('./ffmpeg-runner');
    try {
      runner = await import('./ffmpeg-runner');
    } catch (cause) {
      setState({ status: 'error', kind: 'load', message: cause instanceof Error ? cause.message : String(cause) });
      return null;
    }
    try {
      const blob = await runner.transcode(job, (progress) => {
        if (mounted.current) setState({ status: 'running', progress });
      });
      setState({ status: 'done' });
      return blob;
    } catch (cause) {
      const kind = cause instanceof runner.FfmpegLoadError ? 'load' : 'job';
      setState({ status: 'error', kind, message: cause instanceof Error ? cause.message : String(cause) });
      return null;
    }
  }, []);

  const reset = useCallback(() => setState({ status: 'idle' }), []);
  return { state, run, reset };
}
