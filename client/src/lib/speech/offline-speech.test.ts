import { afterEach, describe, expect, it } from 'vitest';
import { FakeRecognition, fakeSpeechWindow } from './fake-web-speech';
import { createOfflineNoticeOnce, isOnline, listeningUnavailable, recognitionNeedsNetwork } from './offline-speech';
import { ScriptedEngine } from './scripted-engine';
import { WebSpeechEngine } from './web-speech-engine';

afterEach(() => FakeRecognition.reset());

describe('speech with no signal', () => {
  it('says a browser recogniser needs a network unless the language is installed on the phone', async () => {
    const engine = new WebSpeechEngine(fakeSpeechWindow());
    FakeRecognition.availability = 'downloadable';
    expect(await recognitionNeedsNetwork(engine, 'en')).toBe(true);

    const installed = new WebSpeechEngine(fakeSpeechWindow());
    FakeRecognition.availability = 'available';
    expect(await recognitionNeedsNetwork(installed, 'es')).toBe(false);
    expect(FakeRecognition.availableCalls.at(-1)).toEqual({ langs: ['es-US'], processLocally: true });
  });

  it('never blames the network for an engine that does not listen through one', async () => {
    expect(await recognitionNeedsNetwork(new ScriptedEngine([]), 'en')).toBe(false);
  });

  it('takes listening as unavailable only offline with a recogniser that needs a network', () => {
    expect(listeningUnavailable(false, true)).toBe(true);
    expect(listeningUnavailable(true, true)).toBe(false);
    expect(listeningUnavailable(false, false)).toBe(false);
    expect(isOnline({ onLine: false })).toBe(false);
    expect(isOnline(undefined)).toBe(true);
  });

  it('hands out the notice once per walk-around, in the turn language', () => {
    const noticeOnce = createOfflineNoticeOnce();
    expect(noticeOnce('es')?.spoken).toMatch(/^No hay señal/);
    expect(noticeOnce('en')).toBeNull();
  });
});
