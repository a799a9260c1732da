// The browser's own speech: SpeechSynthesis for prompts, SpeechRecognition (prefixed or not) for answers.
// Every call is guarded by a timer: headless and some mobile browsers never fire `end`.
import type { Alternative, Locale } from '@yardcall/shared';
import { speechError, speechErrorFromBrowser } from './speech-errors';
import type {
  ListenOptions,
  ListenResult,
  SpeakOptions,
  SpeechCapabilities,
  SpeechEngine,
  SpeechError,
  SpeechErrorCode,
} from './types';

// The parts of the Web Speech API this engine uses, typed here because TypeScript's DOM library
// lacks the recognition interface and the newer on-device members.
export interface RecognitionAlternativeLike {
  transcript: string;
  confidence: number;
}
export interface RecognitionResultLike {
  readonly length: number;
  readonly isFinal?: boolean;
  [index: number]: RecognitionAlternativeLike | undefined;
}
export interface RecognitionEventLike {
  readonly resultIndex?: number;
  readonly results: { readonly length: number; [index: number]: RecognitionResultLike | undefined };
}
export interface RecognitionErrorEventLike {
  readonly error: string;
  readonly message?: string;
}
export interface RecognitionLike {
  lang: string;
  continuous: boolean;
  interimResults: boolean;
  maxAlternatives: number;
  processLocally?: boolean;
  phrases?: unknown;
  onresult: ((event: RecognitionEventLike) => void) | null;
  onerror: ((event: RecognitionErrorEventLike) => void) | null;
  onend: (() => void) | null;
  onspeechend?: (() => void) | null;
  start(): void;
  stop(): void;
  abort(): void;
}
export type Availability = 'available' | 'downloadable' | 'downloading' | 'unavailable';
export interface RecognitionConstructorLike {
  new (): RecognitionLike;
  available?: (options: { langs: string[]; processLocally: boolean }) => Promise<Availability>;
}
export interface PhraseConstructorLike {
  new (phrase: string, boost?: number): unknown;
}
export interface UtteranceLike {
  text: string;
  lang: string;
  rate: number;
  voice: VoiceLike | null;
  onend: (() => void) | null;
  onerror: ((event: { error?: string }) => void) | null;
}
export interface VoiceLike {
  lang: string;
  localService?: boolean;
}
export interface SynthesisLike {
  speak(utterance: UtteranceLike): void;
  cancel(): void;
  getVoices(): VoiceLike[];
  readonly speaking?: boolean;
}
export interface SpeechWindowLike {
  SpeechRecognition?: RecognitionConstructorLike;
  webkitSpeechRecognition?: RecognitionConstructorLike;
  SpeechRecognitionPhrase?: PhraseConstructorLike;
  speechSynthesis?: SynthesisLike;
  SpeechSynthesisUtterance?: new (text: string) => UtteranceLike;
}

export interface WebSpeechOptions {
  // BCP 47 tags per locale; US drivers first (common practice, not a rule).
  languageTags?: Partial<Record<Locale, string>>;
  maxAlternatives?: number;
  // How long `available()` may take before on-device is taken as unavailable.
  availabilityTimeoutMs?: number;
  now?: () => number;
}

const DEFAULT_TAGS: Record<Locale, string> = { en: 'en-US', es: 'es-US' };
// Assumed speaking rate for the synthesis guard: about 13 characters a second, doubled for slack
// (common practice for a time-out; not a published figure).
const MS_PER_CHAR = 150;
const SPEAK_MIN_MS = 2000;
// After silence the recogniser ends; a fresh one is started unless this little time is left.
const MIN_RESTART_MS = 300;

// The DOM library types synthesis more narrowly than fakes and older browsers need; read the real
// window through the structural shape above.
export function speechWindowOf(win: Window | SpeechWindowLike): SpeechWindowLike {
  return win as unknown as SpeechWindowLike;
}

export function recognitionConstructorOf(win: Window | SpeechWindowLike): RecognitionConstructorLike | undefined {
  const w = speechWindowOf(win);
  return w.SpeechRecognition ?? w.webkitSpeechRecognition;
}

function alternativesOf(event: RecognitionEventLike): Alternative[] {
  const alternatives: Alternative[] = [];
  const from = event.resultIndex ?? 0;
  for (let r = from; r < event.results.length; r += 1) {
    const result = event.results[r];
    if (!result || result.isFinal === false) continue;
    for (let a = 0; a < result.length; a += 1) {
      const alt = result[a];
      if (!alt || typeof alt.transcript !== 'string') continue;
      const transcript = alt.transcript.trim();
      if (transcript === '') continue;
      alternatives.push(
        typeof alt.confidence === 'number' && alt.confidence > 0
          ? { transcript, confidence: alt.confidence }
          : { transcript },
      );
    }
  }
  return alternatives;
}

function withTimeout<T>(promise: Promise<T>, ms: number, fallback: T): Promise<T> {
  return new Promise<T>((resolve) => {
    const timer = setTimeout(() => resolve(fallback), ms);
    promise.then(
      (value) => {
        clearTimeout(timer);
        resolve(value);
      },
      () => {
        clearTimeout(timer);
        resolve(fallback);
      },
    );
  });
}

interface Turn {
  settle: (result: ListenResult) => void;
  recognition: RecognitionLike | undefined;
  locale: Locale;
}

export class WebSpeechEngine implements SpeechEngine {
  readonly name = 'web-speech' as const;
  readonly capabilities: SpeechCapabilities;
  private readonly win: SpeechWindowLike;
  private readonly Recognition: RecognitionConstructorLike | undefined;
  private readonly tags: Record<Locale, string>;
  private readonly maxAlternatives: number;
  private readonly availabilityTimeoutMs: number;
  private readonly now: () => number;
  private speaking: Promise<void> | undefined;
  private finishSpeaking: (() => void) | undefined;
  private turn: Turn | undefined;
  private readonly onDevice = new Map<string, boolean>();
  // Set when the recogniser rejected our word hints, so later turns stop sending them.
  private phrasesRejected = false;

  constructor(win: Window | SpeechWindowLike, options: WebSpeechOptions = {}) {
    this.win = speechWindowOf(win);
    this.Recognition = recognitionConstructorOf(win);
    this.tags = { ...DEFAULT_TAGS, ...options.languageTags };
    this.maxAlternatives = options.maxAlternatives ?? 5;
    this.availabilityTimeoutMs = options.availabilityTimeoutMs ?? 1000;
    this.now = options.now ?? (() => performance.now());
    this.capabilities = {
      synthesis: Boolean(this.win.speechSynthesis && this.win.SpeechSynthesisUtterance),
      recognition: Boolean(this.Recognition),
      typed: false,
      onDevice: typeof this.Recognition?.available === 'function',
      phrases: Boolean(this.win.SpeechRecognitionPhrase),
    };
  }

  speak(text: string, { locale }: SpeakOptions): Promise<void> {
    // Never hear our own prompt as an answer.
    this.abort();
    this.cancel();
    const synth = this.win.speechSynthesis;
    const Utterance = this.win.SpeechSynthesisUtterance;
    if (!synth || !Utterance || text.trim() === '') return Promise.resolve();
    const spoken = new Promise<void>((resolve) => {
      let timer: ReturnType<typeof setTimeout> | undefined;
      const done = () => {
        if (timer !== undefined) clearTimeout(timer);
        if (this.finishSpeaking === done) {
          this.finishSpeaking = undefined;
          this.speaking = undefined;
        }
        resolve();
      };
      this.finishSpeaking = done;
      try {
        const utterance = new Utterance(text);
        const tag = this.tags[locale];
        utterance.lang = tag;
        utterance.rate = 1;
        utterance.voice = this.voiceFor(synth, tag);
        utterance.onend = done;
        // `synthesis-failed` (headless Chromium), `interrupted`, `canceled`: the prompt is also shown.
        utterance.onerror = done;
        timer = setTimeout(done, SPEAK_MIN_MS + text.length * MS_PER_CHAR);
        synth.speak(utterance);
      } catch {
        done();
      }
    });
    this.speaking = spoken;
    return spoken;
  }

  cancel(): void {
    const finish = this.finishSpeaking;
    if (!finish) return;
    try {
      this.win.speechSynthesis?.cancel();
    } catch {
      // A synthesis that throws on cancel has nothing left to stop.
    }
    finish();
  }

  // Whether this browser can recognise the language on the phone itself (installed, no download):
  // with no signal, only then does listening work.
  async recognisesOffline(locale: Locale): Promise<boolean> {
    const Recognition = this.Recognition;
    return Recognition ? this.onDeviceAvailable(Recognition, this.tags[locale]) : false;
  }

  listen(options: ListenOptions): Promise<ListenResult> {
    this.abort();
    const { locale } = options;
    return new Promise<ListenResult>((resolve) => {
      let settled = false;
      let timer: ReturnType<typeof setTimeout> | undefined;
      const turn: Turn = { settle: () => undefined, recognition: undefined, locale };
      const settle = (result: ListenResult) => {
        if (settled) return;
        settled = true;
        if (timer !== undefined) clearTimeout(timer);
        const recognition = turn.recognition;
        turn.recognition = undefined;
        if (recognition) detach(recognition);
        if (this.turn === turn) this.turn = undefined;
        resolve(result);
      };
      const fail = (code: SpeechErrorCode, error?: SpeechError) =>
        settle({ kind: 'error', error: error ?? speechError(code, locale), endedAt: this.now() });
      turn.settle = settle;
      // Registered at once, so an abort while the prompt is still playing ends this turn too.
      this.turn = turn;
      const Recognition = this.Recognition;
      if (!Recognition) {
        fail('unsupported');
        return;
      }
      void (async () => {
        // Start only once the prompt has finished: the microphone would hear the speaker.
        if (this.speaking) await this.speaking;
        const local = await this.onDeviceAvailable(Recognition, this.tags[locale]);
        if (settled) return;
        this.runTurn(Recognition, options, local, turn, settle, fail, (t) => (timer = t));
      })();
    });
  }

  private runTurn(
    Recognition: RecognitionConstructorLike,
    options: ListenOptions,
    local: boolean,
    turn: Turn,
    settle: (result: ListenResult) => void,
    fail: (code: SpeechErrorCode, error?: SpeechError) => void,
    setTimer: (timer: ReturnType<typeof setTimeout>) => void,
  ): void {
    const { locale } = options;
    const deadline = this.now() + options.timeoutMs;
    let useLocal = local;
    let usePhrases = !this.phrasesRejected && (options.phrases?.length ?? 0) > 0;
    // Whether any recogniser of this turn fired anything; one that never does is hung.
    let lively = false;

    const restart = (old: RecognitionLike) => {
      if (turn.recognition !== old) return;
      detach(old);
      turn.recognition = undefined;
      if (deadline - this.now() < MIN_RESTART_MS) fail('no-speech');
      else startOne();
    };

    const startOne = () => {
      let recognition: RecognitionLike;
      try {
        recognition = new Recognition();
        recognition.lang = this.tags[locale];
        recognition.continuous = false;
        recognition.interimResults = false;
        recognition.maxAlternatives = this.maxAlternatives;
        if (useLocal && 'processLocally' in recognition) recognition.processLocally = true;
        if (usePhrases) this.applyPhrases(recognition, options.phrases ?? []);
      } catch {
        fail('unsupported');
        return;
      }
      turn.recognition = recognition;
      let heard = false;
      recognition.onresult = (event) => {
        lively = true;
        const alternatives = alternativesOf(event);
        if (alternatives.length === 0) return;
        heard = true;
        settle({ kind: 'heard', alternatives, endedAt: this.now() });
      };
      recognition.onerror = (event) => {
        lively = true;
        if (turn.recognition !== recognition) return;
        const error = speechErrorFromBrowser(event.error, locale);
        // Retry in the same turn without the feature the recogniser refused.
        if (error.code === 'language-not-supported' && useLocal) {
          useLocal = false;
          this.onDevice.set(this.tags[locale], false);
          restart(recognition);
          return;
        }
        if ((error.code === 'phrases-not-supported' || error.code === 'bad-grammar') && usePhrases) {
          usePhrases = false;
          this.phrasesRejected = true;
          restart(recognition);
          return;
        }
        if (error.code === 'no-speech') {
          restart(recognition);
          return;
        }
        fail(error.code, error);
      };
      recognition.onend = () => {
        lively = true;
        // Ended after silence: a fresh recognition for the rest of the turn.
        if (!heard) restart(recognition);
      };
      try {
        recognition.start();
      } catch {
        fail('audio-capture');
      }
    };

    startOne();
    // The guard: silence all the way through is `no-speech`; a recogniser that never said a thing is hung.
    setTimer(setTimeout(() => fail(lively ? 'no-speech' : 'timeout'), Math.max(0, deadline - this.now())));
  }

  abort(): void {
    const turn = this.turn;
    if (!turn) return;
    this.turn = undefined;
    turn.settle({ kind: 'error', error: speechError('aborted', turn.locale), endedAt: this.now() });
  }

  private voiceFor(synth: SynthesisLike, tag: string): VoiceLike | null {
    let voices: VoiceLike[];
    try {
      voices = synth.getVoices();
    } catch {
      return null;
    }
    const language = tag.slice(0, 2).toLowerCase();
    const exact = voices.filter((v) => v.lang.toLowerCase() === tag.toLowerCase());
    const same = exact.length > 0 ? exact : voices.filter((v) => v.lang.toLowerCase().startsWith(language));
    // Voices on the device keep working with no signal.
    return same.find((v) => v.localService) ?? same[0] ?? null;
  }

  private applyPhrases(recognition: RecognitionLike, phrases: readonly string[]): void {
    const Phrase = this.win.SpeechRecognitionPhrase;
    if (!Phrase || !('phrases' in recognition)) return;
    try {
      recognition.phrases = phrases.map((phrase) => new Phrase(phrase, 5));
    } catch {
      this.phrasesRejected = true;
    }
  }

  private async onDeviceAvailable(Recognition: RecognitionConstructorLike, tag: string): Promise<boolean> {
    const known = this.onDevice.get(tag);
    if (known !== undefined) return known;
    const available = Recognition.available;
    if (typeof available !== 'function') {
      this.onDevice.set(tag, false);
      return false;
    }
    // Only what is installed already: a download is the user's choice, not the loop's.
    let answer: Promise<Availability | 'unknown'>;
    try {
      answer = available.call(Recognition, { langs: [tag], processLocally: true });
    } catch {
      answer = Promise.resolve('unknown');
    }
    const result = await withTimeout<Availability | 'unknown'>(answer, this.availabilityTimeoutMs, 'unknown');
    const local = result === 'available';
    this.onDevice.set(tag, local);
    return local;
  }
}

function detach(recognition: RecognitionLike): void {
  recognition.onresult = null;
  recognition.onerror = null;
  recognition.onend = null;
  try {
    recognition.abort();
  } catch {
    // Already stopped.
  }
}
