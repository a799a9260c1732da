// Fakes of the browser's recognition and synthesis objects, driven by the test that uses them.
import type {
  Availability,
  RecognitionErrorEventLike,
  RecognitionEventLike,
  RecognitionLike,
  SpeechWindowLike,
  SynthesisLike,
  UtteranceLike,
  VoiceLike,
} from './web-speech-engine';

export class FakeRecognition implements RecognitionLike {
  static instances: FakeRecognition[] = [];
  static availability: Availability | 'never' = 'unavailable';
  static availableCalls: { langs: string[]; processLocally: boolean }[] = [];
  // Called on every start(); a test uses it to answer, fail or stay silent.
  static onStart: (recognition: FakeRecognition) => void = () => undefined;

  static reset(): void {
    FakeRecognition.instances = [];
    FakeRecognition.availability = 'unavailable';
    FakeRecognition.availableCalls = [];
    FakeRecognition.onStart = () => undefined;
  }

  static available(options: { langs: string[]; processLocally: boolean }): Promise<Availability> {
    FakeRecognition.availableCalls.push(options);
    const answer = FakeRecognition.availability;
    return answer === 'never' ? new Promise<Availability>(() => undefined) : Promise.resolve(answer);
  }

  lang = '';
  continuous = true;
  interimResults = true;
  maxAlternatives = 1;
  processLocally = false;
  phrases: unknown = [];
  onresult: ((event: RecognitionEventLike) => void) | null = null;
  onerror: ((event: RecognitionErrorEventLike) => void) | null = null;
  onend: (() => void) | null = null;
  started = false;
  aborted = false;
  // Set when a prompt was still being said at start(): the microphone would hear it.
  startedWhileSpeaking = false;
  static synthesis: FakeSynthesis | undefined;

  start(): void {
    this.started = true;
    this.startedWhileSpeaking = FakeRecognition.synthesis?.speaking ?? false;
    FakeRecognition.instances.push(this);
    FakeRecognition.onStart(this);
  }

  stop(): void {
    this.onend?.();
  }

  abort(): void {
    this.aborted = true;
  }

  // Test helpers: what a browser would fire.
  answer(alternatives: { transcript: string; confidence: number }[]): void {
    const result = Object.assign([...alternatives], { isFinal: true });
    this.onresult?.({ resultIndex: 0, results: [result] });
    this.onend?.();
  }

  fail(error: string, thenEnd = true): void {
    this.onerror?.({ error });
    if (thenEnd) this.onend?.();
  }
}

// The prefixed name, as Chromium and Safari expose it.
export class FakeWebkitRecognition extends FakeRecognition {}

export class FakeUtterance implements UtteranceLike {
  lang = '';
  rate = 1;
  voice: VoiceLike | null = null;
  onend: (() => void) | null = null;
  onerror: ((event: { error?: string }) => void) | null = null;
  constructor(public text: string) {}
}

export class FakeSynthesis implements SynthesisLike {
  queue: UtteranceLike[] = [];
  spokenTexts: string[] = [];
  utterances: UtteranceLike[] = [];
  voices: VoiceLike[] = [];
  // 'end' finishes at once, 'fail' errors like headless Chromium, 'hang' never ends.
  mode: 'end' | 'fail' | 'hang' | 'manual' = 'end';
  speaking = false;

  speak(utterance: UtteranceLike): void {
    const u = utterance;
    this.spokenTexts.push(u.text);
    this.utterances.push(u);
    this.queue.push(u);
    this.speaking = true;
    if (this.mode === 'end') queueMicrotask(() => this.finish());
    if (this.mode === 'fail')
      queueMicrotask(() => {
        this.speaking = false;
        this.queue.shift()?.onerror?.({ error: 'synthesis-failed' });
      });
  }

  finish(): void {
    this.speaking = false;
    this.queue.shift()?.onend?.();
  }

  cancel(): void {
    this.speaking = false;
    const queued = this.queue;
    this.queue = [];
    for (const u of queued) u.onerror?.({ error: 'interrupted' });
  }

  getVoices(): VoiceLike[] {
    return this.voices;
  }
}

export function fakeSpeechWindow(
  options: { prefixed?: boolean; recognition?: boolean; synthesis?: boolean; phrases?: boolean } = {},
): SpeechWindowLike & { speechSynthesis?: FakeSynthesis } {
  const { prefixed = false, recognition = true, synthesis = true, phrases = false } = options;
  const synth = synthesis ? new FakeSynthesis() : undefined;
  FakeRecognition.synthesis = synth;
  const win: SpeechWindowLike & { speechSynthesis?: FakeSynthesis } = {};
  if (recognition) {
    if (prefixed) win.webkitSpeechRecognition = FakeWebkitRecognition;
    else win.SpeechRecognition = FakeRecognition;
  }
  if (synth) {
    win.speechSynthesis = synth;
    win.SpeechSynthesisUtterance = FakeUtterance;
  }
  if (phrases) {
    win.SpeechRecognitionPhrase = class {
      constructor(
        public phrase: string,
        public boost = 1,
      ) {}
    };
  }
  return win;
}
