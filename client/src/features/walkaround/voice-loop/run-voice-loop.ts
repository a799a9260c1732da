// Runs the voice loop's effects against a SpeechEngine: say, listen, feed what was heard back in.
// The glove screen drives the walk-around through this; tests drive it with the scripted engine.
import {
  answerWordsLoaded,
  loadAnswerWords,
  type Checklist,
  type ItemResult,
  type Locale,
  type ReadingRule,
} from '@yardcall/shared';
import type { ListenResult, SpeechEngine } from '@/lib/speech';
import {
  initialVoiceLoopState,
  reduceVoiceLoop,
  warmVoiceLoop,
  type VoiceLoopContext,
  type VoiceLoopEffect,
  type VoiceLoopEvent,
  type VoiceLoopState,
} from './voice-loop';

// From the end of the driver's answer to the start of the next prompt: the loop's own delay.
export interface TurnTiming {
  answerEndedAt: number;
  promptStartedAt: number;
  latencyMs: number;
}

export interface TimingSummary {
  count: number;
  p50Ms: number;
  p95Ms: number;
  maxMs: number;
}

// Nearest-rank percentiles of the loop's own delay, for the benchmark and the tests.
export function summarizeTimings(timings: readonly TurnTiming[]): TimingSummary {
  const sorted = timings.map((t) => t.latencyMs).sort((a, b) => a - b);
  const rank = (p: number) => sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)] ?? Number.NaN;
  return { count: sorted.length, p50Ms: rank(50), p95Ms: rank(95), maxMs: sorted.at(-1) ?? Number.NaN };
}

export interface VoiceLoopFinish {
  results: ItemResult[];
  notDone: string[];
}

export interface VoiceLoopHost {
  // Save one answer (idempotent by item key: "back" answers an item again).
  onResult(result: ItemResult): void | Promise<void>;
  onStartNote?(itemKey: string, heard: string): void | Promise<void>;
  onStopNote?(itemKey: string, heard: string): void | Promise<void>;
  onFinish?(finish: VoiceLoopFinish): void;
  // Every new state, to store (it is plain JSON) and to render.
  onState?(state: VoiceLoopState): void;
  // Listening cannot work: offer typed input, then send `start` to carry on.
  onSpeechFailed?(failure: { code: string; shown: string }): void;
  onLocale?(locale: Locale): void;
  onTiming?(timing: TurnTiming): void;
  // A host effect (save, note) threw; the loop carries on.
  onHostError?(error: unknown): void;
}

export interface RunVoiceLoopOptions {
  // A restored state resumes at its item; otherwise the walk-around starts at the first.
  initialState?: VoiceLoopState;
  // The language to start in when `checklist` is a function of the language.
  locale?: Locale;
  autoStart?: boolean;
  // The clock of the timings; the engine's `endedAt` must use the same one.
  now?: () => number;
  // When answers were given, for the results.
  wallClock?: () => Date;
  // Readings the organisation requires; by default none.
  requiredReadings?: readonly ReadingRule[];
}

export interface VoiceLoopRunner {
  getState(): VoiceLoopState;
  // Sends an event (a button, a language, `start` to resume), interrupting any prompt or turn.
  send(event: VoiceLoopEvent): void;
  // Resolves when the loop stops running: finished, stalled, interrupted or stopped.
  whenIdle(): Promise<VoiceLoopState>;
  readonly running: boolean;
  readonly timings: readonly TurnTiming[];
  stop(): void;
}

export type ChecklistSource = Checklist | ((locale: Locale) => Checklist);

function contextOf(source: ChecklistSource, requiredReadings: readonly ReadingRule[]): VoiceLoopContext {
  // A single checklist keeps its own prompts whatever the language; the loop's words still switch.
  return { checklistFor: typeof source === 'function' ? source : () => source, requiredReadings };
}

function eventOf(result: ListenResult, at: string): VoiceLoopEvent | 'aborted' {
  if (result.kind === 'heard') return { type: 'heard', alternatives: result.alternatives, at };
  const { code, fatal, spoken, shown } = result.error;
  if (code === 'aborted') return 'aborted';
  if (code === 'no-speech' || code === 'timeout') return { type: 'silence' };
  return { type: 'speech_error', code, fatal, spoken, shown };
}

export function runVoiceLoop(
  engine: SpeechEngine,
  checklist: ChecklistSource,
  host: VoiceLoopHost,
  options: RunVoiceLoopOptions = {},
): VoiceLoopRunner {
  const ctx = contextOf(checklist, options.requiredReadings ?? []);
  const now = options.now ?? (() => performance.now());
  const wallClock = options.wallClock ?? (() => new Date());
  const startLocale = options.locale ?? (typeof checklist === 'function' ? 'en' : checklist.locale);
  let state = options.initialState ?? initialVoiceLoopState(ctx.checklistFor(startLocale));
  const timings: TurnTiming[] = [];
  let generation = 0;
  let stopped = false;
  let running = false;
  let answerEndedAt: number | null = null;
  let idleWaiters: ((state: VoiceLoopState) => void)[] = [];
  // Ends a note that reached its longest length; the loop says so.
  let noteTimer: ReturnType<typeof setTimeout> | undefined;
  const clearNoteTimer = () => {
    clearTimeout(noteTimer);
    noteTimer = undefined;
  };
  const warmed = new Set<Locale>();

  const hostCall = (call: () => void | Promise<void>) => {
    // Saving must not hold up the next prompt: results go to a local store that answers quickly.
    try {
      const pending = call();
      if (pending) pending.catch((error: unknown) => host.onHostError?.(error));
    } catch (error) {
      host.onHostError?.(error);
    }
  };

  const becomeIdle = () => {
    running = false;
    const waiters = idleWaiters;
    idleWaiters = [];
    for (const resolve of waiters) resolve(state);
  };

  // Runs one step's effects; returns the event a listen turn produced, if any.
  const runEffects = async (
    effects: readonly VoiceLoopEffect[],
    gen: number,
  ): Promise<VoiceLoopEvent | 'stop' | null> => {
    for (const effect of effects) {
      if (stopped || gen !== generation) return 'stop';
      switch (effect.type) {
        case 'speak': {
          if (answerEndedAt !== null) {
            const promptStartedAt = now();
            const timing = { answerEndedAt, promptStartedAt, latencyMs: promptStartedAt - answerEndedAt };
            answerEndedAt = null;
            timings.push(timing);
            host.onTiming?.(timing);
          }
          const spoken = engine.speak(effect.text, { locale: effect.locale });
          if (!warmed.has(effect.locale)) {
            warmed.add(effect.locale);
            // While the prompt is said: fetch the language's words if it is new, then compile them.
            const locale = effect.locale;
            loadAnswerWords(locale).then(
              () => warmVoiceLoop(locale),
              () => warmed.delete(locale),
            );
          }
          await spoken;
          break;
        }
        case 'listen': {
          const result = await engine.listen({
            locale: effect.locale,
            phrases: effect.phrases,
            timeoutMs: effect.timeoutMs,
          });
          if (stopped || gen !== generation) return 'stop';
          if (result.kind === 'heard') answerEndedAt = result.endedAt;
          const event = eventOf(result, wallClock().toISOString());
          // Cancelled by the system (another app took the microphone) or the end of a script.
          return event === 'aborted' ? 'stop' : event;
        }
        case 'save':
          hostCall(() => host.onResult(effect.result));
          break;
        case 'startNote':
          clearNoteTimer();
          noteTimer = setTimeout(() => send({ type: 'note_limit' }), effect.maxMs);
          hostCall(() => host.onStartNote?.(effect.itemKey, effect.heard));
          break;
        case 'stopNote':
          clearNoteTimer();
          hostCall(() => host.onStopNote?.(effect.itemKey, effect.heard));
          break;
        case 'setLocale':
          host.onLocale?.(effect.locale);
          break;
        case 'speechFailed':
          host.onSpeechFailed?.({ code: effect.code, shown: effect.shown });
          break;
        case 'finish':
          host.onFinish?.({ results: effect.results, notDone: effect.notDone });
          break;
      }
    }
    return null;
  };

  const drive = async (first: VoiceLoopEvent) => {
    const gen = ++generation;
    running = true;
    let event: VoiceLoopEvent | null = first;
    while (event && !stopped && gen === generation) {
      // An answer is read in the loop's language: its words may still be on their way (a switch).
      if (!answerWordsLoaded(state.locale)) {
        await loadAnswerWords(state.locale);
        if (stopped || gen !== generation) break;
      }
      const step = reduceVoiceLoop(state, event, ctx);
      state = step.state;
      host.onState?.(state);
      const next = await runEffects(step.effects, gen);
      event = next === 'stop' ? null : next;
    }
    if (gen === generation) becomeIdle();
  };

  const send = (event: VoiceLoopEvent) => {
    if (stopped) return;
    // Interrupt whatever is being said or heard; the interrupted turn's result is dropped.
    generation += 1;
    answerEndedAt = null;
    engine.cancel();
    engine.abort();
    void drive(event);
  };

  if (options.autoStart ?? true) void drive({ type: 'start' });

  return {
    getState: () => state,
    send,
    whenIdle: () => (running ? new Promise((resolve) => idleWaiters.push(resolve)) : Promise.resolve(state)),
    get running() {
      return running;
    },
    timings,
    stop: () => {
      if (stopped) return;
      stopped = true;
      generation += 1;
      clearNoteTimer();
      engine.cancel();
      engine.abort();
      becomeIdle();
    },
  };
}
