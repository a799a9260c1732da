// For desktops and browsers without a recogniser: prompts are shown (and said, if a voice is given),
// answers come from a field the screen provides, through a small subscribe API.
import type { Locale } from '@yardcall/shared';
import { speechError } from './speech-errors';
import type { ListenOptions, ListenResult, SpeakOptions, SpeechCapabilities, SpeechEngine } from './types';

export interface TypedInputSnapshot {
  // The last prompt, to show; null before the first.
  prompt: string | null;
  locale: Locale;
  // True while an answer is awaited: the screen enables its field.
  listening: boolean;
}

// Something that can say a prompt aloud; a Web Speech engine fits.
export interface PromptVoice {
  speak(text: string, options: SpeakOptions): Promise<void>;
  cancel(): void;
}

export interface TypedInputOptions {
  voice?: PromptVoice;
  // A typist is not nagged: turns wait for the answer unless this is set (tests, kiosks).
  honourTimeouts?: boolean;
  now?: () => number;
}

export class TypedInputEngine implements SpeechEngine {
  readonly name = 'typed-input' as const;
  readonly capabilities: SpeechCapabilities;
  private snapshot: TypedInputSnapshot = { prompt: null, locale: 'en', listening: false };
  private readonly listeners = new Set<(snapshot: TypedInputSnapshot) => void>();
  private readonly voice: PromptVoice | undefined;
  private readonly now: () => number;
  private readonly honourTimeouts: boolean;
  private pending:
    { resolve: (result: ListenResult) => void; locale: Locale; timer?: ReturnType<typeof setTimeout> } | undefined;

  constructor(options: TypedInputOptions = {}) {
    this.voice = options.voice;
    this.now = options.now ?? (() => performance.now());
    this.honourTimeouts = options.honourTimeouts ?? false;
    this.capabilities = {
      synthesis: Boolean(this.voice),
      recognition: false,
      typed: true,
      onDevice: true,
      phrases: false,
    };
  }

  // Shaped for React's useSyncExternalStore.
  subscribe = (listener: (snapshot: TypedInputSnapshot) => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = (): TypedInputSnapshot => this.snapshot;

  async speak(text: string, options: SpeakOptions): Promise<void> {
    this.update({ prompt: text, locale: options.locale });
    if (this.voice) await this.voice.speak(text, options);
  }

  cancel(): void {
    this.voice?.cancel();
  }

  listen(options: ListenOptions): Promise<ListenResult> {
    this.abort();
    return new Promise<ListenResult>((resolve) => {
      const pending: NonNullable<typeof this.pending> = { resolve, locale: options.locale };
      // A typed answer has no silence to end it; the time-out holds only when asked for.
      if (this.honourTimeouts && Number.isFinite(options.timeoutMs)) {
        pending.timer = setTimeout(() => {
          if (this.pending !== pending) return;
          this.settle({ kind: 'error', error: speechError('no-speech', options.locale), endedAt: this.now() });
        }, options.timeoutMs);
      }
      this.pending = pending;
      this.update({ listening: true, locale: options.locale });
    });
  }

  abort(): void {
    const pending = this.pending;
    if (!pending) return;
    this.settle({ kind: 'error', error: speechError('aborted', pending.locale), endedAt: this.now() });
  }

  // What the driver typed. Returns false when nothing was waiting for an answer.
  submit(text: string): boolean {
    const transcript = text.trim();
    if (!this.pending || transcript === '') return false;
    this.settle({ kind: 'heard', alternatives: [{ transcript, confidence: 1 }], endedAt: this.now() });
    return true;
  }

  private settle(result: ListenResult): void {
    const pending = this.pending;
    if (!pending) return;
    this.pending = undefined;
    if (pending.timer !== undefined) clearTimeout(pending.timer);
    this.update({ listening: false });
    pending.resolve(result);
  }

  private update(change: Partial<TypedInputSnapshot>): void {
    this.snapshot = { ...this.snapshot, ...change };
    for (const listener of this.listeners) listener(this.snapshot);
  }
}
