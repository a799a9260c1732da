// Narration mode: the student talks freely while the engine listens turn after turn; every turn
// heard becomes a timed segment for the scorer. No prompts are spoken: the student leads.
import { normaliseText, type Locale, type TrainingSegmentUpsert } from '@yardcall/shared';
import type { SpeechEngine, SpeechError } from '@/lib/speech';

// One listening turn; the engine restarts after silences within it.
export const NARRATION_TURN_MS = 30_000;
// Our own estimate of speaking pace (about 130 words a minute, from memory): a recogniser gives the
// end of a phrase, not its start, so the start is placed back by the words said, plus a margin.
export const MS_PER_WORD = 450;
export const START_MARGIN_MS = 500;
// A turn that failed at once waits this long before the next, so a failing engine never spins.
const RETRY_PAUSE_MS = 250;

export interface NarrationLoopOptions {
  engine: SpeechEngine;
  locale: Locale;
  // The recording's start on the same clock as `now` (performance.now by default).
  startedAt: number;
  now?: () => number;
  onSegment: (segment: TrainingSegmentUpsert) => void;
  // A fatal engine error: listening stops; the recording goes on.
  onFatal?: (error: SpeechError) => void;
}

export interface NarrationLoop {
  stop(): Promise<void>;
  readonly done: Promise<void>;
}

export function estimateStartMs(turnStartMs: number, endMs: number, text: string): number {
  const words = text.split(' ').filter(Boolean).length;
  return Math.max(0, Math.round(Math.max(turnStartMs, endMs - words * MS_PER_WORD - START_MARGIN_MS)));
}

function pause(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}

export function startNarrationLoop(options: NarrationLoopOptions): NarrationLoop {
  const { engine, locale, startedAt, onSegment, onFatal } = options;
  const now = options.now ?? (() => performance.now());
  let stopped = false;
  let seq = 0;

  const run = async () => {
    while (!stopped) {
      const turnStart = now();
      const result = await engine.listen({ locale, timeoutMs: NARRATION_TURN_MS });
      if (result.kind === 'heard') {
        // The words as the scorer reads them (lower case, no punctuation), accents kept for the trainer.
        const text = normaliseText(result.alternatives[0]?.transcript ?? '', locale).surface.join(' ');
        if (text) {
          const endMs = Math.max(0, Math.round(result.endedAt - startedAt));
          const startMs = Math.min(endMs, estimateStartMs(turnStart - startedAt, endMs, text));
          onSegment({ seq, text, startMs, endMs });
          seq += 1;
        }
        continue;
      }
      if (stopped) break;
      if (result.error.fatal) {
        onFatal?.(result.error);
        break;
      }
      // Always give the page a turn between failed listens, and a pause after an instant failure.
      await pause(now() - turnStart < RETRY_PAUSE_MS ? RETRY_PAUSE_MS : 0);
    }
  };
  const done = run();
  return {
    done,
    stop: async () => {
      stopped = true;
      engine.abort();
      await done;
    },
  };
}
