// The one speech-engine interface the voice loop talks to; engines differ, the loop does not.
import type { Alternative, Locale } from '@yardcall/shared';

export type { Alternative, Locale };

// The recogniser's own codes (Web Speech API) plus two of the engine's: a turn that ran out of time
// and a browser with no recogniser at all.
export const SPEECH_ERROR_CODES = [
  'no-speech',
  'aborted',
  'audio-capture',
  'network',
  'not-allowed',
  'service-not-allowed',
  'language-not-supported',
  'bad-grammar',
  'phrases-not-supported',
  'timeout',
  'unsupported',
] as const;
export type SpeechErrorCode = (typeof SPEECH_ERROR_CODES)[number];

export interface SpeechError {
  code: SpeechErrorCode;
  // Fatal: listening will not work again by retrying; the host should offer typed input.
  fatal: boolean;
  // What to say and what to show, in the turn's language.
  spoken: string;
  shown: string;
}

export interface SpeakOptions {
  locale: Locale;
}

export interface ListenOptions {
  locale: Locale;
  // Words worth biasing the recogniser towards, where it supports that.
  phrases?: readonly string[];
  // The whole turn, restarts after silence included.
  timeoutMs: number;
}

export type ListenResult =
  | { kind: 'heard'; alternatives: Alternative[]; endedAt: number }
  | { kind: 'error'; error: SpeechError; endedAt: number };

export interface SpeechCapabilities {
  // Spoken prompts are audible (not only shown).
  synthesis: boolean;
  recognition: boolean;
  // The driver types instead of speaking.
  typed: boolean;
  onDevice: boolean;
  phrases: boolean;
}

export interface SpeechEngine {
  readonly name: 'web-speech' | 'typed-input' | 'scripted';
  readonly capabilities: SpeechCapabilities;
  // Resolves when the text has been said, or when it was cancelled. Never rejects.
  speak(text: string, options: SpeakOptions): Promise<void>;
  cancel(): void;
  // One turn: resolves with the recogniser's hypotheses or a typed error. Never rejects.
  listen(options: ListenOptions): Promise<ListenResult>;
  // Ends the current turn at once with `aborted`.
  abort(): void;
}
