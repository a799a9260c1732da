import { describe, expect, it } from 'vitest';
import type { TrainingSegmentUpsert } from '@yardcall/shared';
import { ScriptedEngine, speechError } from '@/lib/speech';
import { estimateStartMs, startNarrationLoop } from './narration-loop';

describe('narration loop', () => {
  it('turns each heard phrase into a numbered, timed segment in lower case without punctuation', async () => {
    let clock = 10_000;
    const now = () => clock;
    const engine = new ScriptedEngine(['Checking the LEFT steer tire, tread looks good.', 'Oil level: good!', ''], {
      now: () => (clock += 2_000),
    });
    const segments: TrainingSegmentUpsert[] = [];
    const loop = startNarrationLoop({
      engine,
      locale: 'en',
      startedAt: 10_000,
      now,
      onSegment: (s) => segments.push(s),
    });
    await new Promise((resolve) => setTimeout(resolve, 20));
    await loop.stop();
    expect(segments.map((s) => [s.seq, s.text])).toEqual([
      [0, 'checking the left steer tire tread looks good'],
      [1, 'oil level good'],
    ]);
    for (const s of segments) {
      expect(s.startMs).toBeGreaterThanOrEqual(0);
      expect(s.endMs).toBeGreaterThanOrEqual(s.startMs);
    }
    expect(segments[1]!.startMs).toBeGreaterThan(segments[0]!.endMs - 1);
  });

  it('stops listening on a fatal engine error and says so', async () => {
    const engine = new ScriptedEngine([{ error: 'not-allowed' }]);
    const fatal: string[] = [];
    const loop = startNarrationLoop({
      engine,
      locale: 'en',
      startedAt: performance.now(),
      onSegment: () => undefined,
      onFatal: (error) => fatal.push(error.code),
    });
    await loop.done;
    expect(fatal).toEqual([speechError('not-allowed', 'en').code]);
  });

  it('places a phrase start back by the words said, never before the turn began', () => {
    expect(estimateStartMs(0, 10_000, 'one two three four')).toBe(10_000 - 4 * 450 - 500);
    expect(estimateStartMs(9_000, 10_000, 'one two three four')).toBe(9_000);
  });

  it('sends the words as the scorer reads them: hyphens and marks go, accents and fractions stay', async () => {
    const engine = new ScriptedEngine(['  Glad-hands, OK?  ', 'Cámara de freno: 4/32', '¿?']);
    const segments: TrainingSegmentUpsert[] = [];
    const loop = startNarrationLoop({
      engine,
      locale: 'es',
      startedAt: performance.now(),
      onSegment: (s) => segments.push(s),
    });
    await new Promise((resolve) => setTimeout(resolve, 20));
    await loop.stop();
    expect(segments.map((s) => s.text)).toEqual(['glad hands ok', 'cámara de freno 4/32']);
  });
});
