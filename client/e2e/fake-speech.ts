import type { Page } from '@playwright/test';

// The plan the fake recogniser follows, read by the init script. By default it answers as a
// competent driver does: "good" at every stop, a value only where one is asked, "yes" to a read-back.
export interface SpeechPlan {
  // Answer this many turns, then stay silent (for the reload test); null answers to the end.
  answerTurns: number | null;
  skipAt: number | null;
  noteAt: number | null;
  // A steer-tire tread depth said below its limit at its stop, then confirmed.
  lowTreadKey: string | null;
  // How long a note is talked for before it ends (default 2.5 s).
  noteMs?: number;
  // A note on this item's stop (said before its answer) instead of at turn `noteAt`, and its words.
  noteKey?: string;
  noteWords?: string;
  // The note's words end with "end note" in the same sentence, as people talk.
  noteEndsInSentence?: boolean;
  // Answers said in order where their key matches, before the defaults: `stop:<stopKey>` while a
  // stop is asked as a whole, `item:<itemKey>` while one item is asked, `phase:<phase>` in that
  // phase (confirming, choosing, offering, paused, noting). null is a silent turn.
  script?: Record<string, (string | null)[]>;
  // Now and then an "um" or a "say again" before the answer, as drivers do.
  chatter?: boolean;
  // How long after listening starts an answer comes (default 40 ms).
  answerMs?: number;
  // The phone recognises speech on the device (no network needed), as some phones do.
  onDevice?: boolean;
}

export interface RecognitionScript {
  // The words heard at the end of a listening turn; null is silence (nothing heard, the turn stays open).
  decide: () => string | null;
  // How long after listening starts the words come.
  delayMs: () => number;
  confidence: number;
  // When set, the recogniser says whether it works on the device (SpeechRecognition.available);
  // without it, recognition needs a network, as a browser's server-side recogniser does.
  onDevice?: boolean;
  onAnswer?: () => void;
}

// The page's SpeechRecognition, replaced by one that hands over scripted words. Runs in the page:
// sent as source by initScript, so it uses nothing from this module.
function scriptedRecognition(script: RecognitionScript): void {
  class ScriptedRecognition {
    processLocally = false;
    lang = '';
    continuous = false;
    interimResults = false;
    maxAlternatives = 1;
    onresult: ((event: unknown) => void) | null = null;
    onerror: ((event: unknown) => void) | null = null;
    onend: (() => void) | null = null;
    private done = false;
    start(): void {
      setTimeout(() => {
        if (this.done) return;
        const text = script.decide();
        if (text === null) return;
        const result = Object.assign([{ transcript: text, confidence: script.confidence }], { isFinal: true });
        this.done = true;
        script.onAnswer?.();
        this.onresult?.({ resultIndex: 0, results: [result] });
        this.onend?.();
      }, script.delayMs());
    }
    stop(): void {
      this.abort();
    }
    abort(): void {
      if (this.done) return;
      this.done = true;
      this.onend?.();
    }
  }
  if (script.onDevice !== undefined) {
    const answer = script.onDevice ? 'available' : 'unavailable';
    Object.assign(ScriptedRecognition, { available: () => Promise.resolve(answer) });
  }
  Object.defineProperty(window, 'SpeechRecognition', { value: ScriptedRecognition, configurable: true });
  Object.defineProperty(window, 'webkitSpeechRecognition', { value: ScriptedRecognition, configurable: true });
}

// Headless Chromium cannot speak or listen: both are replaced before the app loads. The fake
// recogniser answers each turn from what the screen shows (stop, item, what it expects, the phase).
function fakeSpeech(p: SpeechPlan): void {
  interface Turn {
    phase: string;
    stop: string;
    key: string;
    mode: string;
    expects: string;
    answer: string | null;
  }
  const w = window as unknown as Record<string, unknown>;
  const turns: Turn[] = [];
  w.__speechTurns = turns;
  const spoken: string[] = [];
  w.__spoken = spoken;
  // When each final answer was delivered and each prompt began (performance.now()): the
  // answer-to-prompt latency the benchmark reads.
  const answeredAt: number[] = [];
  const promptedAt: number[] = [];
  w.__answeredAt = answeredAt;
  w.__promptedAt = promptedAt;
  const script: Record<string, (string | null)[]> = JSON.parse(JSON.stringify(p.script ?? {})) as Record<
    string,
    (string | null)[]
  >;
  let asked = 0;
  let skipped = false;
  let noted = 0;
  let lowSaid = false;
  let chatty = 0;
  const air: Record<string, string> = {
    low_air_warning: 'sixty five psi',
    spring_brakes: 'thirty psi',
    governor_cut_out: 'one twenty five psi',
    governor_cut_in: 'one hundred five psi',
  };
  const measure = (quantity: string, key: string): string => {
    switch (quantity) {
      case 'tread_depth':
        return 'ten thirty-seconds';
      case 'tire_pressure':
        // Steer tires of the demo tractors are set to 110 psi, the others to 100 psi.
        return key.startsWith('u1.axle1.') ? 'one hundred twelve psi' : 'one hundred two psi';
      case 'lining_thickness':
        return 'half an inch';
      case 'pushrod_stroke':
        return 'one and a half inches';
      case 'steering_lash':
        return 'one inch';
      case 'leak_rate':
        return 'one psi per minute';
      case 'air_pressure':
        return air[key.split('.').pop() ?? ''] ?? 'one hundred psi';
      default:
        return 'good';
    }
  };
  const fromScript = (key: string): string | null | undefined => {
    const queue = script[key];
    if (!queue || queue.length === 0) return undefined;
    return queue.shift() ?? null;
  };
  const decide = (): string | null => {
    const card = document.querySelector<HTMLElement>('[data-testid="walkaround-item"]');
    const phase = card?.dataset.phase ?? '';
    const stop = card?.dataset.stopKey ?? '';
    const key = card?.dataset.itemKey ?? '';
    const mode = card?.dataset.mode ?? 'stop';
    const expects = card?.dataset.expects ?? 'check';
    const record = (answer: string | null) => {
      turns.push({ phase, stop, key, mode, expects, answer });
      return answer;
    };
    const scriptKey = phase === 'asking' ? (mode === 'stop' ? `stop:${stop}` : `item:${key}`) : `phase:${phase}`;
    const scripted = fromScript(scriptKey);
    if (scripted !== undefined) return record(scripted);
    if (phase === 'confirming' || phase === 'offering') return record('yes');
    if (phase === 'paused') return record('resume');
    if (phase === 'choosing') return record('one by one');
    if (phase === 'noting') {
      const words = p.noteWords ?? 'the marker lens is cracked on the left side';
      if (noted++ > 0) return record('end note');
      return record(p.noteEndsInSentence ? `${words}, end note` : words);
    }
    if (p.answerTurns !== null && asked >= p.answerTurns) return record(null);
    asked += 1;
    if (p.chatter && phase === 'asking' && chatty++ % 9 === 4) return record(chatty % 2 === 0 ? 'um' : 'say again');
    if (p.skipAt !== null && asked === p.skipAt && !skipped) {
      skipped = true;
      return record('skip');
    }
    // A note about the low tread is said as the next prompt starts, once the defect is recorded.
    const noteOnDefect = p.noteKey !== undefined && p.noteKey === p.lowTreadKey;
    const noteHere =
      p.noteKey !== undefined &&
      (noteOnDefect
        ? lowSaid
        : key === p.noteKey || (mode === 'stop' && card?.dataset.stopItems?.split(' ').includes(p.noteKey)));
    if (noted === 0 && ((p.noteAt !== null && asked === p.noteAt) || noteHere)) return record('note');
    const lowHere = p.lowTreadKey !== null && card?.dataset.stopItems?.split(' ').includes(p.lowTreadKey);
    if (mode === 'stop' && lowHere && !lowSaid) {
      lowSaid = true;
      return record('good, one thirty-second');
    }
    if (mode === 'stop') return record('good');
    if (key === p.lowTreadKey) return record('one thirty-second');
    return record(expects === 'check' ? 'good' : measure(expects, key));
  };

  scriptedRecognition({
    decide,
    // After React has shown the new state; a note is talked for a few seconds, as a driver would.
    delayMs: () =>
      document.querySelector<HTMLElement>('[data-testid="walkaround-item"]')?.dataset.phase === 'noting'
        ? (p.noteMs ?? 2500)
        : (p.answerMs ?? 40),
    confidence: 0.95,
    onDevice: p.onDevice ?? false,
    onAnswer: () => answeredAt.push(performance.now()),
  });
  class FakeUtterance {
    lang = '';
    rate = 1;
    voice: unknown = null;
    onend: (() => void) | null = null;
    onerror: (() => void) | null = null;
    constructor(public text: string) {}
  }
  const synthesis = {
    speaking: false,
    pending: false,
    paused: false,
    onvoiceschanged: null,
    getVoices: () => [],
    speak(utterance: FakeUtterance) {
      promptedAt.push(performance.now());
      spoken.push(utterance.text);
      setTimeout(() => utterance.onend?.(), 5);
    },
    cancel() {},
    pause() {},
    resume() {},
    addEventListener() {},
    removeEventListener() {},
  };
  Object.defineProperty(window, 'speechSynthesis', { value: synthesis, configurable: true });
  Object.defineProperty(window, 'SpeechSynthesisUtterance', { value: FakeUtterance, configurable: true });
}

// An init script from a function and its JSON argument, with scriptedRecognition beside it. Sent as
// source text: a compiler that keeps function names (tsx, for the benchmarks) wraps named functions
// in a `__name` helper the page lacks, so the page gets a stand-in.
function initScript<Arg>(run: (arg: Arg) => void, arg: Arg): { content: string } {
  return {
    content:
      'var __name = (fn) => fn;\n' +
      `var scriptedRecognition = ${scriptedRecognition.toString()};\n` +
      `(${run.toString()})(${JSON.stringify(arg)});`,
  };
}

export async function installFakeSpeech(page: Page, plan: SpeechPlan): Promise<void> {
  await page.addInitScript(initScript(fakeSpeech, plan));
}

// A student's narration, one phrase per listening turn (1.5 s after it starts), then silence.
function scriptedNarration(phrases: string[]): void {
  let next = 0;
  scriptedRecognition({
    decide: () => {
      const text = phrases[next];
      if (text === undefined) return null;
      next += 1;
      return text;
    },
    delayMs: () => 1500,
    confidence: 0.92,
  });
}

// Headless Chromium cannot recognise speech: the recogniser is replaced before the app loads.
export async function installScriptedNarration(page: Page, lines: readonly string[]): Promise<void> {
  await page.addInitScript(initScript(scriptedNarration, [...lines]));
}
