import type { ListenOptions, ListenResult, SpeakOptions, SpeechEngine } from '@/lib/speech';

export interface EngineObserver {
  onSpoken(text: string): void;
  onHeard(transcript: string): void;
}

// The same engine, telling the screen what was said and heard, so the driver can read it too.
export function observeEngine(engine: SpeechEngine, observer: EngineObserver): SpeechEngine {
  return {
    name: engine.name,
    capabilities: engine.capabilities,
    speak(text: string, options: SpeakOptions): Promise<void> {
      observer.onSpoken(text);
      return engine.speak(text, options);
    },
    cancel: () => engine.cancel(),
    async listen(options: ListenOptions): Promise<ListenResult> {
      const result = await engine.listen(options);
      if (result.kind === 'heard') observer.onHeard(result.alternatives[0]?.transcript ?? '');
      return result;
    },
    abort: () => engine.abort(),
  };
}
