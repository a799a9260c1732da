import { useSyncExternalStore } from 'react';
import type { Locale, SpeechEngine } from './types';
import { WebSpeechEngine } from './web-speech-engine';

// With no signal, a recogniser that runs on a server cannot hear anything: the prompts are still
// spoken (voices are on the phone) and the glove screen, swipes and headset buttons carry the run.

export function isOnline(nav: Pick<Navigator, 'onLine'> | undefined = globalThis.navigator): boolean {
  return nav?.onLine !== false;
}

// Whether listening with this engine needs a network: only a browser recogniser without the
// language installed on the phone does (typed input and scripted engines never do).
export async function recognitionNeedsNetwork(engine: SpeechEngine, locale: Locale): Promise<boolean> {
  if (!engine.capabilities.recognition) return false;
  if (engine instanceof WebSpeechEngine) return !(await engine.recognisesOffline(locale));
  return false;
}

// Listening is pointless now: no signal and a recogniser that needs one.
export function listeningUnavailable(online: boolean, needsNetwork: boolean): boolean {
  return !online && needsNetwork;
}

// Said once per walk-around, the first time listening is unavailable (words in the turn's language).
export const OFFLINE_SPEECH_NOTICE: Record<Locale, { spoken: string; shown: string }> = {
  en: {
    spoken:
      "No signal, so I can't hear answers. I'll keep reading each check: answer with the buttons, a swipe or your headset.",
    shown:
      'No signal: speech recognition needs one here. Prompts are still read out; answer with the buttons, a swipe or the headset buttons.',
  },
  es: {
    spoken:
      'No hay señal, así que no puedo oír las respuestas. Seguiré leyendo cada punto: responda con los botones, deslizando o con los auriculares.',
    shown:
      'Sin señal: el reconocimiento de voz la necesita aquí. Los avisos se siguen leyendo; responda con los botones, deslizando o con los botones de los auriculares.',
  },
};

// Hands the notice out the first time it is asked for, then null: "say so once".
export function createOfflineNoticeOnce(): (locale: Locale) => { spoken: string; shown: string } | null {
  let said = false;
  return (locale) => {
    if (said) return null;
    said = true;
    return OFFLINE_SPEECH_NOTICE[locale];
  };
}

function subscribeToConnection(listener: () => void): () => void {
  window.addEventListener('online', listener);
  window.addEventListener('offline', listener);
  return () => {
    window.removeEventListener('online', listener);
    window.removeEventListener('offline', listener);
  };
}

const onlineSnapshot = () => isOnline();

// Re-renders when the phone gains or loses its network.
export function useOnline(): boolean {
  return useSyncExternalStore(subscribeToConnection, onlineSnapshot, onlineSnapshot);
}
