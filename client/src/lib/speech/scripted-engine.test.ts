import { describe, expect, it } from 'vitest';
import { ScriptedEngine } from './scripted-engine';

const options = { locale: 'en' as const, timeoutMs: 1000 };

describe('ScriptedEngine', () => {
  it('answers turns from a list and records each prompt with its time', async () => {
    let clock = 100;
    const engine = new ScriptedEngine(['good', [{ transcript: 'five', confidence: 0.7 }], { error: 'no-speech' }], {
      now: () => (clock += 10),
    });
    await engine.speak('Headlamps?', { locale: 'en' });
    await expect(engine.listen(options)).resolves.toMatchObject({
      kind: 'heard',
      alternatives: [{ transcript: 'good' }],
    });
    await expect(engine.listen(options)).resolves.toMatchObject({
      alternatives: [{ transcript: 'five', confidence: 0.7 }],
    });
    const failed = await engine.listen(options);
    expect(failed.kind === 'error' && failed.error.code).toBe('no-speech');
    expect(engine.spoken).toEqual([
      { text: 'Headlamps?', locale: 'en', startedAt: 110, endedAt: 120, cancelled: false },
    ]);
    expect(engine.remaining).toBe(0);
    const ended = await engine.listen(options);
    expect(ended.kind === 'error' && ended.error.code).toBe('aborted');
  });

  it('answers from a function of the prompt', async () => {
    const engine = new ScriptedEngine(({ prompt }) => (prompt.includes('tread') ? 'six thirty seconds' : 'good'));
    await engine.speak('Check the tread depth.', { locale: 'en' });
    const first = await engine.listen(options);
    await engine.speak('Check the rim.', { locale: 'en' });
    const second = await engine.listen(options);
    expect(first.kind === 'heard' && first.alternatives[0]?.transcript).toBe('six thirty seconds');
    expect(second.kind === 'heard' && second.alternatives[0]?.transcript).toBe('good');
  });

  it('notes a turn asked for while a prompt is still being said', async () => {
    const engine = new ScriptedEngine(['good'], { speakMs: 20 });
    const spoken = engine.speak('Mirrors?', { locale: 'en' });
    const turn = engine.listen(options);
    expect(engine.listenedWhileSpeaking).toBe(true);
    await Promise.all([spoken, turn]);
  });
});
