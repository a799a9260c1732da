import type { Page } from '@playwright/test';

// The plan the fake recogniser follows, read by the init script.
export interface SpeechPlan {
  // Answer this many turns, then stay silent (for the reload test); null answers to the end.
  answerTurns: number | null;
  skipAt: number | null;
  noteAt: number | null;
  // A steer-tire tread depth said below its limit, then confirmed.
  lowTreadKey: string | null;
  // How long a note is talked for before "end note" (default 2.5 s).
  noteMs?: number;
  // A note on this item (said before its answer) instead of at turn `noteAt`, and its words.
  noteKey?: string;
  noteWords?: string;
}

// Headless Chromium cannot speak or listen: both are replaced before the app loads. The fake
// recogniser answers each turn from what the screen shows (item, what it expects, the loop's phase).
function fakeSpeech(p: SpeechPlan): void {
  interface Turn {
    phase: string;
    key: string;
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
  let asked = 0;
  let skipped = false;
  let noted = 0;
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
  const decide = (): string | null => {
    const card = document.querySelector<HTMLElement>('[data-testid="walkaround-item"]');
    const phase = card?.dataset.phase ?? '';
    const key = card?.dataset.itemKey ?? '';
    const expects = card?.dataset.expects ?? 'check';
    let answer: string | null;
    if (phase === 'confirming' || phase === 'offering') answer = 'yes';
    else if (phase === 'noting')
      answer = noted++ === 0 ? (p.noteWords ?? 'the marker lens is cracked on the left side') : 'end note';
    else if (p.answerTurns !== null && asked >= p.answerTurns) answer = null;
    else {
      asked += 1;
      if (p.skipAt !== null && asked === p.skipAt && !skipped) {
        skipped = true;
        answer = 'skip';
      } else if (
        noted === 0 &&
        ((p.noteAt !== null && asked === p.noteAt) || (p.noteKey !== undefined && key === p.noteKey))
      )
        answer = 'note';
      else if (key === p.lowTreadKey) answer = 'one thirty-second';
      else answer = expects === 'check' ? 'good' : measure(expects, key);
    }
    turns.push({ phase, key, expects, answer });
    return answer;
  };

  class FakeRecognition {
    lang = '';
    continuous = false;
    interimResults = false;
    maxAlternatives = 1;
    onresult: ((event: unknown) => void) | null = null;
    onerror: ((event: unknown) => void) | null = null;
    onend: (() => void) | null = null;
    private done = false;
    start(): void {
      // After React has shown the new state; a note is talked for a few seconds, as a driver would.
      const noting = document.querySelector<HTMLElement>('[data-testid="walkaround-item"]')?.dataset.phase === 'noting';
      setTimeout(
        () => {
          if (this.done) return;
          const text = decide();
          // Silence: the recogniser says nothing at all, as a driver at work would.
          if (text === null) return;
          const result = Object.assign([{ transcript: text, confidence: 0.95 }], { isFinal: true });
          this.done = true;
          answeredAt.push(performance.now());
          this.onresult?.({ resultIndex: 0, results: [result] });
          this.onend?.();
        },
        noting ? (p.noteMs ?? 2500) : 40,
      );
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
  Object.defineProperty(window, 'SpeechRecognition', { value: FakeRecognition, configurable: true });
  Object.defineProperty(window, 'webkitSpeechRecognition', { value: FakeRecognition, configurable: true });
}

export async function installFakeSpeech(page: Page, plan: SpeechPlan): Promise<void> {
  // Sent as source text. A compiler that keeps function names (tsx, for the benchmarks) wraps named
  // functions in a `__name` helper the page lacks, so the page gets a stand-in.
  await page.addInitScript({
    content: `var __name = (fn) => fn;\n(${fakeSpeech.toString()})(${JSON.stringify(plan)});`,
  });
}
