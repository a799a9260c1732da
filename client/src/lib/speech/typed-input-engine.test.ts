import { describe, expect, it, vi } from 'vitest';
import { TypedInputEngine, type TypedInputSnapshot } from './typed-input-engine';

describe('TypedInputEngine', () => {
  it('shows each prompt to subscribers and answers a turn with what was typed', async () => {
    const engine = new TypedInputEngine();
    const seen: TypedInputSnapshot[] = [];
    const unsubscribe = engine.subscribe((s) => seen.push(s));
    await engine.speak('Check the headlamps.', { locale: 'en' });
    const turn = engine.listen({ locale: 'en', timeoutMs: Number.POSITIVE_INFINITY });
    expect(engine.getSnapshot()).toEqual({ prompt: 'Check the headlamps.', locale: 'en', listening: true });
    expect(engine.submit('  defect, cracked lens ')).toBe(true);
    await expect(turn).resolves.toMatchObject({
      kind: 'heard',
      alternatives: [{ transcript: 'defect, cracked lens', confidence: 1 }],
    });
    expect(engine.getSnapshot().listening).toBe(false);
    expect(seen.map((s) => s.listening)).toEqual([false, true, false]);
    unsubscribe();
    await engine.speak('Next.', { locale: 'en' });
    expect(seen).toHaveLength(3);
  });

  it('ignores a submit when no answer is awaited or the text is blank', async () => {
    const engine = new TypedInputEngine();
    expect(engine.submit('good')).toBe(false);
    const turn = engine.listen({ locale: 'es', timeoutMs: 1000 });
    expect(engine.submit('   ')).toBe(false);
    engine.abort();
    const result = await turn;
    expect(result.kind === 'error' && result.error.code).toBe('aborted');
  });

  it('says prompts through a voice when one is given', async () => {
    const voice = { speak: vi.fn(() => Promise.resolve()), cancel: vi.fn() };
    const engine = new TypedInputEngine({ voice });
    expect(engine.capabilities.synthesis).toBe(true);
    await engine.speak('Revise los espejos.', { locale: 'es' });
    expect(voice.speak).toHaveBeenCalledWith('Revise los espejos.', { locale: 'es' });
  });

  it('waits for the typist past the time-out by default', async () => {
    vi.useFakeTimers();
    const engine = new TypedInputEngine();
    const turn = engine.listen({ locale: 'en', timeoutMs: 500 });
    await vi.advanceTimersByTimeAsync(5000);
    expect(engine.getSnapshot().listening).toBe(true);
    engine.submit('good');
    await expect(turn).resolves.toMatchObject({ kind: 'heard' });
    vi.useRealTimers();
  });

  it('ends a turn with no-speech when asked to honour the time-out', async () => {
    vi.useFakeTimers();
    const engine = new TypedInputEngine({ now: () => Date.now(), honourTimeouts: true });
    const turn = engine.listen({ locale: 'en', timeoutMs: 500 });
    await vi.advanceTimersByTimeAsync(600);
    const result = await turn;
    expect(result.kind === 'error' && result.error.code).toBe('no-speech');
    vi.useRealTimers();
  });
});
