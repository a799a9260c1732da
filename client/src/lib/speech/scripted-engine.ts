// For tests and benchmarks: answers each listen turn from a script and records every prompt with its time.
import type { Alternative, Locale } from '@yardcall/shared';
import { speechError } from './speech-errors';
import type {
  ListenOptions,
  ListenResult,
  SpeakOptions,
  SpeechCapabilities,
  SpeechEngine,
  SpeechErrorCode,
} from './types';

// A transcript, several hypotheses, or a recogniser failure.
export type ScriptedReply = string | readonly Alternative[] | { error: SpeechErrorCode };

export interface ScriptedTurn {
  // The last prompt spoken before this turn, and every prompt since the previous turn.
  prompt: string;
  prompts: readonly string[];
  locale: Locale;
  turn: number;
  options: ListenOptions;
}

// A list played in order, or a function of the turn; undefined ends the script.
export type Script = readonly ScriptedReply[] | ((turn: ScriptedTurn) => ScriptedReply | undefined);

export interface SpokenRecord {
  text: string;
  locale: Locale;
  startedAt: number;
  endedAt: number;
  cancelled: boolean;
}

export interface ListenRecord {
  options: ListenOptions;
  startedAt: number;
  endedAt: number;
  result: ListenResult;
}

export interface ScriptedEngineOptions {
  now?: () => number;
  // Simulated time to say a prompt and to hear an answer; 0 answers on the next microtask.
  speakMs?: number;
  answerMs?: number;
}

function toAlternatives(reply: string | readonly Alternative[]): Alternative[] {
  return typeof reply === 'string' ? [{ transcript: reply, confidence: 0.95 }] : reply.map((a) => ({ ...a }));
}

function wait(ms: number): Promise<void> {
  return ms > 0 ? new Promise((resolve) => setTimeout(resolve, ms)) : Promise.resolve();
}

export class ScriptedEngine implements SpeechEngine {
  readonly name = 'scripted' as const;
  readonly capabilities: SpeechCapabilities = {
    synthesis: true,
    recognition: true,
    typed: false,
    onDevice: true,
    phrases: true,
  };
  readonly spoken: SpokenRecord[] = [];
  readonly heard: ListenRecord[] = [];
  // True whenever a turn was asked for while a prompt was still being said.
  listenedWhileSpeaking = false;
  private readonly script: Script;
  private readonly now: () => number;
  private readonly speakMs: number;
  private readonly answerMs: number;
  private position = 0;
  private sinceLastTurn: string[] = [];
  private speaking: { record: SpokenRecord; finish: () => void } | undefined;
  private listening: ((result: ListenResult) => void) | undefined;
  private listeningLocale: Locale = 'en';

  constructor(script: Script, options: ScriptedEngineOptions = {}) {
    this.script = script;
    this.now = options.now ?? (() => performance.now());
    this.speakMs = options.speakMs ?? 0;
    this.answerMs = options.answerMs ?? 0;
  }

  get prompts(): string[] {
    return this.spoken.map((s) => s.text);
  }

  // Replies not yet used (a list script only).
  get remaining(): number {
    return typeof this.script === 'function' ? Number.NaN : this.script.length - this.position;
  }

  speak(text: string, { locale }: SpeakOptions): Promise<void> {
    this.abort();
    this.cancel();
    const record: SpokenRecord = { text, locale, startedAt: this.now(), endedAt: Number.NaN, cancelled: false };
    this.spoken.push(record);
    this.sinceLastTurn.push(text);
    return new Promise<void>((resolve) => {
      const finish = () => {
        if (this.speaking?.record === record) this.speaking = undefined;
        if (Number.isNaN(record.endedAt)) record.endedAt = this.now();
        resolve();
      };
      this.speaking = { record, finish };
      void wait(this.speakMs).then(finish);
    });
  }

  cancel(): void {
    const speaking = this.speaking;
    if (!speaking) return;
    speaking.record.cancelled = true;
    speaking.finish();
  }

  listen(options: ListenOptions): Promise<ListenResult> {
    this.abort();
    if (this.speaking) this.listenedWhileSpeaking = true;
    const startedAt = this.now();
    const prompts = this.sinceLastTurn;
    this.sinceLastTurn = [];
    const turnNumber = this.heard.length;
    const reply =
      typeof this.script === 'function'
        ? this.script({
            prompt: prompts.at(-1) ?? this.prompts.at(-1) ?? '',
            prompts,
            locale: options.locale,
            turn: turnNumber,
            options,
          })
        : this.script[this.position];
    this.position += 1;
    return new Promise<ListenResult>((resolve) => {
      const settle = (result: ListenResult) => {
        if (this.listening !== settle) return;
        this.listening = undefined;
        this.heard.push({ options, startedAt, endedAt: result.endedAt, result });
        resolve(result);
      };
      this.listening = settle;
      this.listeningLocale = options.locale;
      void wait(this.answerMs).then(() => {
        // The end of the script stops the loop as an abort would.
        if (reply === undefined)
          settle({ kind: 'error', error: speechError('aborted', options.locale), endedAt: this.now() });
        else if (typeof reply === 'object' && 'error' in reply)
          settle({ kind: 'error', error: speechError(reply.error, options.locale), endedAt: this.now() });
        else settle({ kind: 'heard', alternatives: toAlternatives(reply), endedAt: this.now() });
      });
    });
  }

  abort(): void {
    const listening = this.listening;
    if (!listening) return;
    listening({ kind: 'error', error: speechError('aborted', this.listeningLocale), endedAt: this.now() });
  }
}
