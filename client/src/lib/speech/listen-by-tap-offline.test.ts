import { describe, expect, it } from 'vitest';
import { listenByTapWhenOffline } from './listen-by-tap-offline';
import { ScriptedEngine } from './scripted-engine';

describe('listening with no signal', () => {
  it('listens as usual while there is signal', async () => {
    const engine = listenByTapWhenOffline(new ScriptedEngine(['good']), {
      unavailable: () => false,
      onUnavailable: () => undefined,
    });
    const result = await engine.listen({ locale: 'en', timeoutMs: 1000 });
    expect(result.kind).toBe('heard');
  });

  it('waits for a tap instead of listening, tells the host, and ends the turn when a tap aborts it', async () => {
    const told: string[] = [];
    const base = new ScriptedEngine(['good']);
    const engine = listenByTapWhenOffline(base, { unavailable: () => true, onUnavailable: (l) => told.push(l) });
    const turn = engine.listen({ locale: 'es', timeoutMs: 50 });
    const early = await Promise.race([turn, new Promise((resolve) => setTimeout(() => resolve('still waiting'), 100))]);
    expect(early).toBe('still waiting');
    engine.abort();
    const result = await turn;
    expect(result).toMatchObject({ kind: 'error', error: { code: 'aborted' } });
    expect(told).toEqual(['es']);
    // The prompts are still spoken.
    await engine.speak('Axle 1, left wheel?', { locale: 'en' });
    expect(base.prompts).toEqual(['Axle 1, left wheel?']);
  });
});
