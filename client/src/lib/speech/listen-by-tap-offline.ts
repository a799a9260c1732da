import { speechError } from './speech-errors';
import type { ListenResult, Locale, SpeechEngine } from './types';

// Whether listening cannot work now, set by the screen as the signal comes and goes.
export interface ListeningSwitch {
  isOff(): boolean;
  set(off: boolean): boolean;
}

// `set` answers whether listening just came back on.
export function createListeningSwitch(): ListeningSwitch {
  let off = false;
  return {
    isOff: () => off,
    set(next) {
      const cameBack = off && !next;
      off = next;
      return cameBack;
    },
  };
}

export interface OfflineListening {
  // True while listening cannot work: no signal and a recogniser that needs one.
  unavailable: () => boolean;
  // Called on each turn that waits for a tap instead; the host says the notice once.
  onUnavailable: (locale: Locale) => void;
}

// The same engine, but while listening cannot work a turn waits for a tap, a swipe or a headset
// button (they interrupt the turn with their own answer) instead of failing: the prompts are still
// spoken with the phone's own voices, and nothing is asked again into the void.
export function listenByTapWhenOffline(engine: SpeechEngine, offline: OfflineListening): SpeechEngine {
  let release: (() => void) | null = null;
  return {
    name: engine.name,
    capabilities: engine.capabilities,
    speak: (text, options) => engine.speak(text, options),
    cancel: () => engine.cancel(),
    listen(options): Promise<ListenResult> {
      if (!offline.unavailable()) return engine.listen(options);
      offline.onUnavailable(options.locale);
      return new Promise((resolve) => {
        release = () =>
          resolve({ kind: 'error', error: speechError('aborted', options.locale), endedAt: performance.now() });
      });
    },
    abort() {
      const waiting = release;
      release = null;
      waiting?.();
      engine.abort();
    },
  };
}
