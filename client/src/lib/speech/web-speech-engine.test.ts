import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { FakeRecognition, FakeWebkitRecognition, fakeSpeechWindow } from './fake-web-speech';
import { WebSpeechEngine } from './web-speech-engine';
import { chooseSpeechEngine } from './choose-speech-engine';
import { SPEECH_ERROR_CODES } from './types';

const listenOptions = { locale: 'en' as const, timeoutMs: 5000 };

beforeEach(() => {
  FakeRecognition.reset();
});

afterEach(() => {
  vi.useRealTimers();
});

describe('WebSpeechEngine', () => {
  it('listens with the unprefixed SpeechRecognition and returns every alternative', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow());
    FakeRecognition.onStart = (r) =>
      r.answer([
        { transcript: 'five thirty seconds', confidence: 0.8 },
        { transcript: 'five thirty-seconds', confidence: 0.6 },
      ]);
    const result = await engine.listen(listenOptions);
    expect(result).toMatchObject({
      kind: 'heard',
      alternatives: [
        { transcript: 'five thirty seconds', confidence: 0.8 },
        { transcript: 'five thirty-seconds', confidence: 0.6 },
      ],
    });
    const [recognition] = FakeRecognition.instances;
    expect(recognition).toBeInstanceOf(FakeRecognition);
    expect(recognition?.maxAlternatives).toBeGreaterThan(1);
    expect(recognition?.lang).toBe('en-US');
    expect(recognition?.continuous).toBe(false);
  });

  it('uses the prefixed webkitSpeechRecognition when only that exists', async () => {
    const win = fakeSpeechWindow({ prefixed: true });
    expect(win.SpeechRecognition).toBeUndefined();
    const engine = new WebSpeechEngine(win);
    FakeRecognition.onStart = (r) => r.answer([{ transcript: 'bueno', confidence: 0.9 }]);
    const result = await engine.listen({ ...listenOptions, locale: 'es' });
    expect(result.kind).toBe('heard');
    expect(FakeRecognition.instances[0]).toBeInstanceOf(FakeWebkitRecognition);
    expect(FakeRecognition.instances[0]?.lang).toBe('es-US');
  });

  it.each(SPEECH_ERROR_CODES.filter((c) => c !== 'no-speech' && c !== 'timeout' && c !== 'unsupported'))(
    'maps the recogniser error %s to a typed error with sentences in both languages',
    async (code) => {
      const engine = new WebSpeechEngine(fakeSpeechWindow());
      FakeRecognition.onStart = (r) => r.fail(code);
      const en = await engine.listen(listenOptions);
      const es = await engine.listen({ ...listenOptions, locale: 'es' });
      expect(en.kind).toBe('error');
      expect(es.kind).toBe('error');
      if (en.kind !== 'error' || es.kind !== 'error') return;
      expect(en.error.code).toBe(code);
      expect(es.error.code).toBe(code);
      expect(en.error.spoken.length).toBeGreaterThan(5);
      expect(en.error.shown.length).toBeGreaterThan(5);
      expect(es.error.spoken).not.toBe(en.error.spoken);
      expect(en.error.fatal).toBe(
        ['audio-capture', 'not-allowed', 'service-not-allowed', 'language-not-supported'].includes(code),
      );
    },
  );

  it('maps an unknown browser error code to a retryable network error', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow());
    FakeRecognition.onStart = (r) => r.fail('something-new');
    const result = await engine.listen(listenOptions);
    expect(result.kind === 'error' && result.error).toMatchObject({ code: 'network', fatal: false });
  });

  it('starts a fresh recognition after silence and reports no-speech only when the turn runs out', async () => {
    vi.useFakeTimers();
    const engine = new WebSpeechEngine(fakeSpeechWindow(), { now: () => Date.now() });
    FakeRecognition.onStart = (r) => setTimeout(() => r.fail('no-speech'), 1000);
    const turn = engine.listen({ ...listenOptions, timeoutMs: 3500 });
    await vi.advanceTimersByTimeAsync(3600);
    const result = await turn;
    expect(result.kind === 'error' && result.error.code).toBe('no-speech');
    expect(FakeRecognition.instances.length).toBe(4);
    expect(FakeRecognition.instances.every((r) => r.aborted)).toBe(true);
  });

  it('answers after a restart when the driver speaks on the second recognition', async () => {
    vi.useFakeTimers();
    const engine = new WebSpeechEngine(fakeSpeechWindow(), { now: () => Date.now() });
    FakeRecognition.onStart = (r) => {
      if (FakeRecognition.instances.length === 1) setTimeout(() => r.onend?.(), 500);
      else setTimeout(() => r.answer([{ transcript: 'good', confidence: 0.9 }]), 200);
    };
    const turn = engine.listen(listenOptions);
    await vi.advanceTimersByTimeAsync(800);
    await expect(turn).resolves.toMatchObject({ kind: 'heard', alternatives: [{ transcript: 'good' }] });
  });

  it('guards a recogniser that never fires anything with a timeout', async () => {
    vi.useFakeTimers();
    const engine = new WebSpeechEngine(fakeSpeechWindow(), { now: () => Date.now() });
    const turn = engine.listen({ ...listenOptions, timeoutMs: 2000 });
    await vi.advanceTimersByTimeAsync(2100);
    const result = await turn;
    expect(result.kind === 'error' && result.error.code).toBe('timeout');
    expect(FakeRecognition.instances[0]?.aborted).toBe(true);
  });

  it('uses on-device recognition when available says so, and falls back when the language is refused without an end', async () => {
    vi.useFakeTimers();
    FakeRecognition.availability = 'available';
    const engine = new WebSpeechEngine(fakeSpeechWindow(), { now: () => Date.now() });
    FakeRecognition.onStart = (r) => {
      // Headless Chromium with processLocally: language-not-supported and never `end`.
      if (r.processLocally) r.fail('language-not-supported', false);
      else r.answer([{ transcript: 'good', confidence: 0.9 }]);
    };
    const turn = engine.listen(listenOptions);
    await vi.advanceTimersByTimeAsync(10);
    await expect(turn).resolves.toMatchObject({ kind: 'heard' });
    expect(FakeRecognition.availableCalls).toEqual([{ langs: ['en-US'], processLocally: true }]);
    expect(FakeRecognition.instances.map((r) => r.processLocally)).toEqual([true, false]);
    // The refusal is remembered for later turns.
    await engine.listen(listenOptions);
    expect(FakeRecognition.instances.at(-1)?.processLocally).toBe(false);
  });

  it('does not wait forever on an availability check that never answers', async () => {
    vi.useFakeTimers();
    FakeRecognition.availability = 'never';
    const engine = new WebSpeechEngine(fakeSpeechWindow(), { now: () => Date.now(), availabilityTimeoutMs: 500 });
    FakeRecognition.onStart = (r) => r.answer([{ transcript: 'good', confidence: 0.9 }]);
    const turn = engine.listen(listenOptions);
    await vi.advanceTimersByTimeAsync(600);
    await expect(turn).resolves.toMatchObject({ kind: 'heard' });
    expect(FakeRecognition.instances[0]?.processLocally).toBe(false);
  });

  it('sends phrase hints where SpeechRecognitionPhrase exists and drops them when refused', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow({ phrases: true }));
    FakeRecognition.onStart = (r) => {
      if (Array.isArray(r.phrases) && r.phrases.length > 0) r.fail('phrases-not-supported');
      else r.answer([{ transcript: 'defect', confidence: 0.9 }]);
    };
    const result = await engine.listen({ ...listenOptions, phrases: ['good', 'defect'] });
    expect(result.kind).toBe('heard');
    expect(FakeRecognition.instances[0]?.phrases).toEqual([
      { phrase: 'good', boost: 5 },
      { phrase: 'defect', boost: 5 },
    ]);
    expect(FakeRecognition.instances[1]?.phrases).toEqual([]);
  });

  it('leaves phrases alone where the browser has no phrase support', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow());
    FakeRecognition.onStart = (r) => r.answer([{ transcript: 'good', confidence: 0.9 }]);
    await expect(engine.listen({ ...listenOptions, phrases: ['good'] })).resolves.toMatchObject({ kind: 'heard' });
    expect(FakeRecognition.instances[0]?.phrases).toEqual([]);
  });

  it('never listens while a prompt is being said', async () => {
    const win = fakeSpeechWindow();
    const synth = win.speechSynthesis;
    if (!synth) throw new Error('no synthesis');
    synth.mode = 'manual';
    const engine = new WebSpeechEngine(win);
    FakeRecognition.onStart = (r) => r.answer([{ transcript: 'good', confidence: 0.9 }]);
    const spoken = engine.speak('Check the headlamps.', { locale: 'en' });
    const turn = engine.listen(listenOptions);
    // Long enough for a recogniser to have started if the engine did not wait for the prompt.
    await new Promise((resolve) => setTimeout(resolve, 30));
    expect(FakeRecognition.instances).toHaveLength(0);
    synth.finish();
    await spoken;
    await expect(turn).resolves.toMatchObject({ kind: 'heard' });
    expect(FakeRecognition.instances.every((r) => !r.startedWhileSpeaking)).toBe(true);
  });

  it('stops listening when asked to speak', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow());
    const turn = engine.listen(listenOptions);
    await vi.waitFor(() => expect(FakeRecognition.instances).toHaveLength(1));
    await engine.speak('Say good or defect.', { locale: 'en' });
    const result = await turn;
    expect(result.kind === 'error' && result.error.code).toBe('aborted');
    expect(FakeRecognition.instances[0]?.aborted).toBe(true);
  });

  it('resolves speak when synthesis fails, as in headless Chromium', async () => {
    const win = fakeSpeechWindow();
    if (win.speechSynthesis) win.speechSynthesis.mode = 'fail';
    const engine = new WebSpeechEngine(win);
    await expect(engine.speak('Check the mirrors.', { locale: 'en' })).resolves.toBeUndefined();
  });

  it('resolves speak after a guard time when synthesis never ends', async () => {
    vi.useFakeTimers();
    const win = fakeSpeechWindow();
    if (win.speechSynthesis) win.speechSynthesis.mode = 'hang';
    const engine = new WebSpeechEngine(win);
    let done = false;
    void engine.speak('Check the mirrors.', { locale: 'en' }).then(() => (done = true));
    await vi.advanceTimersByTimeAsync(1000);
    expect(done).toBe(false);
    await vi.advanceTimersByTimeAsync(10_000);
    expect(done).toBe(true);
  });

  it('cancel ends the prompt at once', async () => {
    const win = fakeSpeechWindow();
    if (win.speechSynthesis) win.speechSynthesis.mode = 'hang';
    const engine = new WebSpeechEngine(win);
    const spoken = engine.speak('A long prompt.', { locale: 'es' });
    engine.cancel();
    await expect(spoken).resolves.toBeUndefined();
  });

  it('picks a local voice of the locale', async () => {
    const win = fakeSpeechWindow();
    const synth = win.speechSynthesis;
    if (!synth) throw new Error('no synthesis');
    synth.voices = [
      { lang: 'en-US', localService: false },
      { lang: 'es-MX', localService: false },
      { lang: 'es-US', localService: true },
    ];
    const engine = new WebSpeechEngine(win);
    await engine.speak('Revise los espejos.', { locale: 'es' });
    expect(synth.spokenTexts).toEqual(['Revise los espejos.']);
    expect(synth.utterances[0]?.voice).toBe(synth.voices[2]);
    expect(synth.utterances[0]?.lang).toBe('es-US');
  });

  it('reports unsupported without a recogniser instead of throwing', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow({ recognition: false }));
    const result = await engine.listen(listenOptions);
    expect(result.kind === 'error' && result.error).toMatchObject({ code: 'unsupported', fatal: true });
  });

  it('abort ends the turn with aborted', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow());
    const turn = engine.listen(listenOptions);
    engine.abort();
    const result = await turn;
    expect(result.kind === 'error' && result.error.code).toBe('aborted');
  });
});

describe('chooseSpeechEngine', () => {
  it('chooses the browser speech engine where recognition exists, prefixed or not', () => {
    expect(chooseSpeechEngine(fakeSpeechWindow()).name).toBe('web-speech');
    expect(chooseSpeechEngine(fakeSpeechWindow({ prefixed: true })).name).toBe('web-speech');
  });

  it('chooses typed input without recognition, still saying prompts where synthesis exists', () => {
    const withVoice = chooseSpeechEngine(fakeSpeechWindow({ recognition: false }));
    expect(withVoice.name).toBe('typed-input');
    expect(withVoice.capabilities.synthesis).toBe(true);
    const silent = chooseSpeechEngine(fakeSpeechWindow({ recognition: false, synthesis: false }));
    expect(silent.capabilities.synthesis).toBe(false);
  });

  it('chooses typed input for the jsdom window, which has no speech', () => {
    expect(chooseSpeechEngine(window).name).toBe('typed-input');
  });
});
