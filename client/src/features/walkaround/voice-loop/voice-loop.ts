// The hands-free walk-around as one typed reducer: (state, event) -> next state + effects to run.
//
// Why a hand-written reducer and not a state-machine library: the loop has a handful of phases whose
// transitions all pass through the same few steps (ask, interpret, confirm, save, next), and its
// state must be plain JSON so the host can store it and resume after a reload or an app switch.
// A pure function over plain data gives that for free, runs in unit tests without a browser or a
// timer, and adds nothing to the driver's bundle. Effects (speak, listen, save, notes, finish) are
// returned as data; the runner executes them against a SpeechEngine.
//
// Safety: an unclear answer is never a pass. It is asked again, then the choices are offered; a
// value past its limit is confirmed before it is kept, and is kept as a defect. The app supports and
// does not replace the driver's judgement; the limits are minimums and local rules, the maker's
// specifications and licensed practice govern.
import {
  LimitError,
  confirmKeptPrompt,
  confirmOutOfLimitPrompt,
  evaluateMeasurement,
  interpretConfirmation,
  interpretUtterance,
  languageSwitchedPrompt,
  readBackMeasurement,
  unclearPrompt,
  type Alternative,
  type Checklist,
  type ChecklistItem,
  type Command,
  type ItemResult,
  type Locale,
  type MeasurementVerdict,
  type SpokenMeasurement,
  type UnclearReason,
  type Verdict,
} from '@yardcall/shared';
import { VOICE_LOOP_WORDS, fillWords } from './voice-loop-words';

export const VOICE_LOOP_VERSION = 1;

export const VOICE_LOOP_PHASES = [
  'idle',
  'asking',
  'confirming',
  'paused',
  'noting',
  'offering',
  'stalled',
  'finished',
] as const;
export type VoiceLoopPhase = (typeof VOICE_LOOP_PHASES)[number];

// Where to return after a pause, a note or a speech failure.
type ReturnPhase = 'asking' | 'confirming' | 'offering';

// A value heard and awaiting the driver's yes.
export interface PendingMeasurement {
  measurement: SpokenMeasurement;
  verdict: Verdict | null;
  say: string | null;
  caution: string | null;
  heard: string;
  confidence: number | null;
  // What was said to confirm it, for "repeat".
  question: string;
}

export interface VoiceLoopState {
  version: typeof VOICE_LOOP_VERSION;
  locale: Locale;
  phase: VoiceLoopPhase;
  returnTo: ReturnPhase;
  // The current item, by position and by key (the key survives a rebuilt checklist).
  index: number;
  itemKey: string;
  results: Record<string, ItemResult>;
  // Skipped item keys in the order they were skipped.
  skipped: string[];
  // Keys being revisited at the end, in checklist order; null during the first pass.
  review: string[] | null;
  unclear: number;
  silent: number;
  pending: PendingMeasurement | null;
  noteHeard: string[] | null;
  // For short prompts: how often each title was asked, and the run of one category in one zone.
  titleCounts: Record<string, number>;
  streak: { category: string; zone: string; count: number };
  lastError: string | null;
}

export type VoiceLoopEvent =
  // Begin, or resume after a restore or a speech failure: re-says the current prompt.
  | { type: 'start' }
  | { type: 'heard'; alternatives: Alternative[]; at: string }
  // The turn ended with nothing heard (silence or the turn's time-out).
  | { type: 'silence' }
  | { type: 'speech_error'; code: string; fatal: boolean; spoken: string; shown: string }
  // A button on the screen, said as if spoken.
  | { type: 'command'; command: Exclude<Command, 'language'>; at: string }
  | { type: 'set_locale'; locale: Locale }
  // The screen's list: go to one item (a skipped one, or any to answer again) and ask it in full.
  | { type: 'jump'; itemKey: string };

export type ListenMode = 'answer' | 'confirm' | 'offer' | 'paused' | 'note';

export type VoiceLoopEffect =
  | { type: 'speak'; text: string; locale: Locale }
  | { type: 'listen'; locale: Locale; mode: ListenMode; timeoutMs: number; phrases: readonly string[] }
  | { type: 'save'; result: ItemResult }
  | { type: 'startNote'; itemKey: string; heard: string }
  | { type: 'stopNote'; itemKey: string; heard: string }
  | { type: 'setLocale'; locale: Locale }
  | { type: 'speechFailed'; code: string; shown: string }
  | { type: 'finish'; results: ItemResult[]; notDone: string[] };

export interface VoiceLoopContext {
  // The same walk-around in each language the driver may switch to (item keys are stable).
  checklistFor: (locale: Locale) => Checklist;
}

export interface VoiceLoopStep {
  state: VoiceLoopState;
  effects: VoiceLoopEffect[];
}

// How long one listen turn may last, by what is awaited (common practice for a hands-busy task; not
// a published figure). A pause and a note wait long: the driver is working or talking.
export const LISTEN_TIMEOUT_MS: Record<ListenMode, number> = {
  answer: 12_000,
  confirm: 8_000,
  offer: 10_000,
  paused: 30_000,
  note: 30_000,
};
// Short prompts once this many of a kind have been asked (the driver knows the drill by then).
export const SHORT_PROMPT_AFTER = 3;
// Silent turns before the prompt is said again.
const SILENT_TURNS_BEFORE_REMINDER = 3;
// Items named one by one in the offer of what is not done.
const OFFER_LIST_LENGTH = 3;

export function initialVoiceLoopState(checklist: Checklist): VoiceLoopState {
  return {
    version: VOICE_LOOP_VERSION,
    locale: checklist.locale,
    phase: 'idle',
    returnTo: 'asking',
    index: 0,
    itemKey: checklist.items[0]?.key ?? '',
    results: {},
    skipped: [],
    review: null,
    unclear: 0,
    silent: 0,
    pending: null,
    noteHeard: null,
    titleCounts: {},
    streak: { category: '', zone: '', count: 0 },
    lastError: null,
  };
}

// ---------------------------------------------------------------------------------------------------
// Small builders.

class Step {
  readonly effects: VoiceLoopEffect[] = [];
  constructor(public state: VoiceLoopState) {}

  set(change: Partial<VoiceLoopState>): this {
    this.state = { ...this.state, ...change };
    return this;
  }

  say(...parts: (string | null | undefined)[]): this {
    const text = parts
      .filter((p): p is string => typeof p === 'string' && p.trim() !== '')
      .join(' ')
      .trim();
    if (text !== '') this.effects.push({ type: 'speak', text, locale: this.state.locale });
    return this;
  }

  listen(mode: ListenMode): this {
    const locale = this.state.locale;
    this.effects.push({
      type: 'listen',
      locale,
      mode,
      timeoutMs: LISTEN_TIMEOUT_MS[mode],
      phrases: VOICE_LOOP_WORDS[locale].phrases,
    });
    return this;
  }

  emit(effect: VoiceLoopEffect): this {
    this.effects.push(effect);
    return this;
  }

  done(): VoiceLoopStep {
    return { state: this.state, effects: this.effects };
  }
}

function checklistOf(state: VoiceLoopState, ctx: VoiceLoopContext): Checklist {
  return ctx.checklistFor(state.locale);
}

function itemAt(checklist: Checklist, index: number): ChecklistItem | undefined {
  return checklist.items[index];
}

function currentItem(state: VoiceLoopState, ctx: VoiceLoopContext): ChecklistItem | undefined {
  return itemAt(checklistOf(state, ctx), state.index);
}

function words(state: VoiceLoopState) {
  return VOICE_LOOP_WORDS[state.locale];
}

function notDone(state: VoiceLoopState, checklist: Checklist): ChecklistItem[] {
  return checklist.items.filter((item) => !state.results[item.key]);
}

function withoutKey(list: readonly string[], key: string): string[] {
  return list.filter((k) => k !== key);
}

function listenModeOf(phase: ReturnPhase): ListenMode {
  return phase === 'asking' ? 'answer' : phase === 'confirming' ? 'confirm' : 'offer';
}

// ---------------------------------------------------------------------------------------------------
// Asking an item.

function isShort(state: VoiceLoopState, item: ChecklistItem): boolean {
  const seenTitle = state.titleCounts[item.title] ?? 0;
  const { streak } = state;
  const inStreak = streak.category === item.category && streak.zone === item.zone;
  return seenTitle >= SHORT_PROMPT_AFTER || (inStreak && streak.count >= SHORT_PROMPT_AFTER);
}

// Moves to an item and asks it, counting it towards short prompts; `full` when going back to it.
function arrive(step: Step, index: number, ctx: VoiceLoopContext, prefix: (string | null)[] = [], full = false): Step {
  const checklist = checklistOf(step.state, ctx);
  const item = itemAt(checklist, index);
  if (!item) return goToEnd(step, ctx, ...prefix);
  const previous = itemAt(checklist, step.state.index);
  const newZone = step.state.phase === 'idle' || previous?.zone !== item.zone || index === 0;
  const short = !full && !newZone && isShort(step.state, item);
  const { streak } = step.state;
  const sameRun = streak.category === item.category && streak.zone === item.zone;
  const zoneTitle = newZone ? checklist.zones.find((z) => z.key === item.zone)?.title : undefined;
  step.set({
    phase: 'asking',
    index,
    itemKey: item.key,
    unclear: 0,
    silent: 0,
    pending: null,
    titleCounts: { ...step.state.titleCounts, [item.title]: (step.state.titleCounts[item.title] ?? 0) + 1 },
    streak: { category: item.category, zone: item.zone, count: sameRun ? streak.count + 1 : 1 },
  });
  return step
    .say(...prefix, zoneTitle ? `${zoneTitle}.` : null, short ? item.shortPrompt : item.prompt)
    .listen('answer');
}

// Says the current item again in full, without counting it again.
function reAsk(step: Step, ctx: VoiceLoopContext, ...prefix: (string | null)[]): Step {
  const item = currentItem(step.state, ctx);
  if (!item) return goToEnd(step, ctx, ...prefix);
  step.set({ phase: 'asking', pending: null, unclear: 0, silent: 0 });
  return step.say(...prefix, item.prompt).listen('answer');
}

// The item after the current one: the next in order, or the next one being revisited.
function advance(step: Step, ctx: VoiceLoopContext, ...prefix: (string | null)[]): Step {
  const { review, itemKey, index } = step.state;
  if (review) {
    const position = review.indexOf(itemKey);
    const nextKey = review[position + 1];
    if (nextKey === undefined) return goToEnd(step, ctx, ...prefix);
    const nextIndex = checklistOf(step.state, ctx).items.findIndex((i) => i.key === nextKey);
    return arrive(step, nextIndex, ctx, prefix);
  }
  return arrive(step, index + 1, ctx, prefix);
}

function goBack(step: Step, ctx: VoiceLoopContext): Step {
  const { review, itemKey, index } = step.state;
  const checklist = checklistOf(step.state, ctx);
  let target = index - 1;
  if (review) {
    const previousKey = review[review.indexOf(itemKey) - 1];
    target = previousKey === undefined ? -1 : checklist.items.findIndex((i) => i.key === previousKey);
  }
  if (step.state.phase === 'offering') target = checklist.items.length - 1;
  if (target < 0) return reAsk(step, ctx, words(step.state).firstItem);
  return arrive(step, target, ctx, [], true);
}

function save(step: Step, result: ItemResult): Step {
  const { state } = step;
  step.set({
    results: { ...state.results, [result.itemKey]: result },
    skipped: withoutKey(state.skipped, result.itemKey),
  });
  return step.emit({ type: 'save', result });
}

// ---------------------------------------------------------------------------------------------------
// The end: offer what is not done, or finish.

function offerSentence(state: VoiceLoopState, open: readonly ChecklistItem[]): string {
  const w = words(state);
  const named = open.slice(0, OFFER_LIST_LENGTH).map((item) => `${item.title}, ${item.positionLabel}`);
  if (open.length > OFFER_LIST_LENGTH) named.push(fillWords(w.andMore, { count: open.length - OFFER_LIST_LENGTH }));
  const list = named.join('; ');
  // "Skipped" when the driver skipped every one of them; "not done" when finishing early.
  const allSkipped = open.every((item) => state.skipped.includes(item.key));
  const [one, many] = allSkipped ? [w.skippedOne, w.skippedMany] : [w.openOne, w.openMany];
  return open.length === 1 ? fillWords(one, { list }) : fillWords(many, { count: open.length, list });
}

function goToEnd(step: Step, ctx: VoiceLoopContext, ...prefix: (string | null)[]): Step {
  const checklist = checklistOf(step.state, ctx);
  const open = notDone(step.state, checklist);
  if (open.length === 0) return finish(step, ctx, ...prefix);
  // A new offer starts a new round of revisiting.
  step.set({ phase: 'offering', pending: null, unclear: 0, silent: 0, review: null });
  return step.say(...prefix, offerSentence(step.state, open)).listen('offer');
}

function finish(step: Step, ctx: VoiceLoopContext, ...prefix: (string | null)[]): Step {
  const checklist = checklistOf(step.state, ctx);
  const open = notDone(step.state, checklist);
  const w = words(step.state);
  const sentence =
    open.length === 0
      ? fillWords(w.allDone, { count: checklist.items.length })
      : fillWords(w.finishingOpen, { count: open.length });
  step.set({ phase: 'finished', pending: null, review: null });
  const results = checklist.items.flatMap((item) => {
    const result = step.state.results[item.key];
    return result ? [result] : [];
  });
  return step.say(...prefix, sentence).emit({ type: 'finish', results, notDone: open.map((item) => item.key) });
}

function startReview(step: Step, ctx: VoiceLoopContext): Step {
  const checklist = checklistOf(step.state, ctx);
  const open = notDone(step.state, checklist);
  const first = open[0];
  if (!first) return finish(step, ctx);
  step.set({ review: open.map((item) => item.key) });
  return arrive(step, checklist.items.indexOf(first), ctx);
}

// ---------------------------------------------------------------------------------------------------
// Measurements: read back, confirm, judge.

function judge(
  item: ChecklistItem,
  measurement: SpokenMeasurement,
  locale: Locale,
): MeasurementVerdict | 'implausible' | null {
  if (!item.limitContext) return null;
  try {
    return evaluateMeasurement(measurement.quantity, measurement.value, measurement.unit, item.limitContext, locale);
  } catch (error) {
    if (error instanceof LimitError && error.code === 'invalid_value') return 'implausible';
    // No published limit here: the value is kept without a verdict, and the server judges it again.
    return null;
  }
}

function proposeMeasurement(
  step: Step,
  item: ChecklistItem,
  measurement: SpokenMeasurement,
  heard: string,
  confidence: number | undefined,
): Step {
  const { locale } = step.state;
  const verdict = judge(item, measurement, locale);
  if (verdict === 'implausible') return unclear(step, 'implausible', item);
  const outOfLimit = verdict?.verdict === 'out_of_limit';
  const question = outOfLimit
    ? confirmOutOfLimitPrompt(measurement, verdict.say, locale)
    : readBackMeasurement(measurement, locale);
  step.set({
    phase: 'confirming',
    unclear: 0,
    silent: 0,
    pending: {
      measurement,
      verdict: verdict?.verdict ?? null,
      say: verdict?.say ?? null,
      caution: verdict?.caution ?? null,
      heard,
      confidence: confidence ?? null,
      question,
    },
  });
  return step.say(question).listen('confirm');
}

function keepMeasurement(step: Step, ctx: VoiceLoopContext, at: string): Step {
  const { pending, itemKey, locale } = step.state;
  if (!pending) return reAsk(step, ctx);
  const { measurement, verdict } = pending;
  const outOfLimit = verdict === 'out_of_limit';
  const result: ItemResult = {
    itemKey,
    answer: outOfLimit ? 'defect' : 'pass',
    measurement: { quantity: measurement.quantity, value: measurement.value, unit: measurement.unit },
    heard: pending.heard,
    answeredAt: at,
  };
  if (verdict) result.verdict = verdict;
  if (outOfLimit && pending.say) result.detail = pending.say;
  if (pending.confidence !== null) result.confidence = pending.confidence;
  save(step, result);
  step.set({ pending: null });
  if (outOfLimit) {
    return advance(step, ctx, confirmKeptPrompt(measurement, locale), words(step.state).markedDefect, pending.caution);
  }
  // A value close to its limit is worth saying; a plain pass is acknowledged by the next prompt.
  if (verdict === 'near_limit') return advance(step, ctx, pending.say, pending.caution);
  return advance(step, ctx);
}

// ---------------------------------------------------------------------------------------------------
// Unclear answers: ask again, then offer the choices. Never a pass.

function unclear(step: Step, reason: UnclearReason, item: ChecklistItem | undefined): Step {
  const count = step.state.unclear + 1;
  step.set({ unclear: count, silent: 0 });
  const w = words(step.state);
  const phase = step.state.phase;
  if (phase === 'confirming') return step.say(w.choicesConfirm).listen('confirm');
  if (phase === 'offering') return step.say(w.choicesOffer).listen('offer');
  if (count >= 2) {
    return step.say(item?.expects.type === 'measure' ? w.choicesMeasure : w.choicesCheck).listen('answer');
  }
  return step.say(unclearPrompt(reason, step.state.locale)).listen('answer');
}

// ---------------------------------------------------------------------------------------------------
// Commands, the same at every point.

function whereSentence(state: VoiceLoopState, checklist: Checklist, item: ChecklistItem | undefined): string {
  const w = words(state);
  if (!item) return '';
  return fillWords(w.where, {
    zone: checklist.zones.find((z) => z.key === item.zone)?.title ?? '',
    position: item.positionLabel,
    title: item.title,
    n: state.index + 1,
    total: checklist.items.length,
    done: Object.keys(state.results).length,
  });
}

// What the driver hears again when returning to where they were.
function backToWhereWeWere(step: Step, ctx: VoiceLoopContext, phase: ReturnPhase, ...prefix: (string | null)[]): Step {
  if (phase === 'confirming' && step.state.pending) {
    step.set({ phase: 'confirming', silent: 0 });
    return step.say(...prefix, step.state.pending.question).listen('confirm');
  }
  if (phase === 'offering') return goToEnd(step, ctx, ...prefix);
  return reAsk(step, ctx, ...prefix);
}

function command(step: Step, ctx: VoiceLoopContext, cmd: Exclude<Command, 'language'>, heard: string): Step {
  const { state } = step;
  const w = words(state);
  const phase: ReturnPhase =
    state.phase === 'confirming' ? 'confirming' : state.phase === 'offering' ? 'offering' : 'asking';
  const item = currentItem(state, ctx);
  switch (cmd) {
    case 'repeat':
    case 'resume':
      return backToWhereWeWere(step, ctx, phase);
    case 'back':
      // From a read-back, back means "ask me this one again".
      if (phase === 'confirming') return reAsk(step, ctx);
      return goBack(step, ctx);
    case 'skip':
      if (phase === 'offering') return finish(step, ctx);
      if (item && !state.results[item.key] && !state.skipped.includes(item.key)) {
        step.set({ skipped: [...state.skipped, item.key] });
      }
      return advance(step, ctx, w.skipped);
    case 'pause':
      step.set({ phase: 'paused', returnTo: phase, silent: 0 });
      return step.say(w.paused).listen('paused');
    case 'note':
      step.set({ phase: 'noting', returnTo: phase, noteHeard: [], silent: 0 });
      // Said before the recording starts, so the note does not begin with our own voice.
      return step.say(w.noteStarted).emit({ type: 'startNote', itemKey: state.itemKey, heard }).listen('note');
    case 'end_note':
      // Not recording: nothing to end.
      return step.listen(listenModeOf(phase));
    case 'help': {
      const choices =
        phase === 'confirming'
          ? w.choicesConfirm
          : phase === 'offering'
            ? w.choicesOffer
            : item?.expects.type === 'measure'
              ? w.choicesMeasure
              : w.choicesCheck;
      return step.say(w.help, choices).listen(listenModeOf(phase));
    }
    case 'where':
      return step.say(whereSentence(state, checklistOf(state, ctx), item)).listen(listenModeOf(phase));
    case 'finish':
      if (phase === 'offering') return finish(step, ctx);
      return goToEnd(step, ctx);
  }
}

function switchLocale(step: Step, ctx: VoiceLoopContext, locale: Locale): Step {
  const returnPhase: ReturnPhase =
    step.state.phase === 'confirming' ? 'confirming' : step.state.phase === 'offering' ? 'offering' : 'asking';
  step.set({ locale }).emit({ type: 'setLocale', locale });
  // The pending read-back was said in the old language: ask the item again in the new one.
  if (returnPhase === 'confirming') return reAsk(step, ctx, languageSwitchedPrompt(locale));
  return backToWhereWeWere(step, ctx, returnPhase, languageSwitchedPrompt(locale));
}

// ---------------------------------------------------------------------------------------------------
// What was heard, by phase.

function bestTranscript(alternatives: readonly Alternative[]): string {
  const sorted = [...alternatives].sort((a, b) => (b.confidence ?? -1) - (a.confidence ?? -1));
  return sorted[0]?.transcript ?? '';
}

function onHeard(step: Step, ctx: VoiceLoopContext, alternatives: Alternative[], at: string): Step {
  const { state } = step;
  const item = currentItem(state, ctx);
  step.set({ silent: 0, lastError: null });
  switch (state.phase) {
    case 'asking': {
      if (!item) return goToEnd(step, ctx);
      const meaning = interpretUtterance(alternatives, item.expects, state.locale);
      if (meaning.kind === 'command') {
        return meaning.command === 'language'
          ? switchLocale(step, ctx, meaning.locale)
          : command(step, ctx, meaning.command, meaning.heard);
      }
      if (meaning.kind === 'unclear') return unclear(step, meaning.reason, item);
      if (meaning.kind === 'measurement') {
        return proposeMeasurement(step, item, meaning.measurement, meaning.heard, meaning.confidence);
      }
      const result: ItemResult = { itemKey: item.key, answer: meaning.answer, heard: meaning.heard, answeredAt: at };
      if (meaning.confidence !== undefined) result.confidence = meaning.confidence;
      if (meaning.answer === 'defect' && meaning.detail) result.detail = meaning.detail;
      save(step, result);
      return advance(step, ctx, meaning.answer === 'defect' ? words(state).defectNoted : null);
    }
    case 'confirming': {
      const pending = state.pending;
      if (!item || !pending) return reAsk(step, ctx);
      const answer = interpretConfirmation(alternatives, state.locale, pending.measurement);
      switch (answer.kind) {
        case 'confirm':
          return keepMeasurement(step, ctx, at);
        case 'correct':
          if (answer.measurement) {
            return proposeMeasurement(step, item, answer.measurement, answer.heard, answer.confidence);
          }
          step.set({ phase: 'asking', pending: null, unclear: 0 });
          return step.say(words(state).sayValueAgain).listen('answer');
        case 'command':
          return command(step, ctx, answer.command, answer.heard);
        case 'unclear': {
          // "Español" while confirming: the language switch is a command too.
          const meaning = interpretUtterance(alternatives, item.expects, state.locale);
          if (meaning.kind === 'command' && meaning.command === 'language') {
            return switchLocale(step, ctx, meaning.locale);
          }
          return unclear(step, answer.reason, item);
        }
      }
      break;
    }
    case 'offering': {
      const answer = interpretConfirmation(alternatives, state.locale);
      if (answer.kind === 'confirm') return startReview(step, ctx);
      if (answer.kind === 'correct') return finish(step, ctx);
      const meaning = interpretUtterance(alternatives, { type: 'check' }, state.locale);
      if (meaning.kind === 'command') {
        return meaning.command === 'language'
          ? switchLocale(step, ctx, meaning.locale)
          : command(step, ctx, meaning.command, meaning.heard);
      }
      return unclear(step, 'not_understood', item);
    }
    case 'paused': {
      const meaning = interpretUtterance(alternatives, { type: 'check' }, state.locale);
      if (meaning.kind === 'command' && meaning.command === 'resume') {
        return backToWhereWeWere(step, ctx, state.returnTo, words(state).resuming);
      }
      if (meaning.kind === 'command' && meaning.command === 'language') {
        step.set({ locale: meaning.locale }).emit({ type: 'setLocale', locale: meaning.locale });
        return step.say(words(step.state).paused).listen('paused');
      }
      // Anything else is talk around the truck, not an answer.
      return step.listen('paused');
    }
    case 'noting': {
      const meaning = interpretUtterance(alternatives, { type: 'check' }, state.locale);
      if (meaning.kind === 'command' && meaning.command === 'end_note') {
        const heard = (state.noteHeard ?? []).join(' ');
        step.set({ noteHeard: null }).emit({ type: 'stopNote', itemKey: state.itemKey, heard });
        return backToWhereWeWere(step, ctx, state.returnTo, words(state).noteSaved);
      }
      step.set({ noteHeard: [...(state.noteHeard ?? []), bestTranscript(alternatives)] });
      return step.listen('note');
    }
    case 'idle':
    case 'stalled':
    case 'finished':
      return step;
  }
  return step;
}

function onSilence(step: Step, ctx: VoiceLoopContext): Step {
  const { state } = step;
  switch (state.phase) {
    case 'paused':
      return step.listen('paused');
    case 'noting':
      return step.listen('note');
    case 'asking':
    case 'confirming':
    case 'offering': {
      const silent = state.silent + 1;
      // The driver is working: stay quiet, and only remind them now and then.
      if (silent < SILENT_TURNS_BEFORE_REMINDER) {
        step.set({ silent });
        return step.listen(listenModeOf(state.phase));
      }
      step.set({ silent: 0 });
      if (state.phase === 'asking') {
        const item = currentItem(state, ctx);
        return step.say(item?.shortPrompt).listen('answer');
      }
      return backToWhereWeWere(step, ctx, state.phase);
    }
    case 'idle':
    case 'stalled':
    case 'finished':
      return step;
  }
}

function onSpeechError(step: Step, event: Extract<VoiceLoopEvent, { type: 'speech_error' }>): Step {
  const { state } = step;
  if (state.phase === 'idle' || state.phase === 'finished' || state.phase === 'stalled') return step;
  if (event.fatal) {
    const returnTo: ReturnPhase =
      state.phase === 'confirming' || state.phase === 'offering' ? state.phase : state.returnTo;
    step.set({ phase: 'stalled', returnTo: state.phase === 'asking' ? 'asking' : returnTo, lastError: event.code });
    return step.say(event.spoken).emit({ type: 'speechFailed', code: event.code, shown: event.shown });
  }
  // Said once per kind of failure, then retried quietly.
  const first = state.lastError !== event.code;
  step.set({ lastError: event.code });
  if (first) step.say(event.spoken);
  const mode: ListenMode =
    state.phase === 'paused' ? 'paused' : state.phase === 'noting' ? 'note' : listenModeOf(state.phase);
  return step.listen(mode);
}

function onStart(step: Step, ctx: VoiceLoopContext): Step {
  const { state } = step;
  const w = words(state);
  const checklist = checklistOf(state, ctx);
  switch (state.phase) {
    case 'idle':
      return arrive(step, state.index, ctx, [fillWords(w.intro, { count: checklist.items.length })]);
    case 'finished':
      return step;
    case 'paused':
      return step.say(w.paused).listen('paused');
    case 'noting':
      // The recording did not survive the interruption: back to the item.
      step.set({ noteHeard: null });
      return reAsk(step, ctx, w.resumed);
    case 'stalled':
      step.set({ lastError: null });
      return backToWhereWeWere(step, ctx, state.returnTo, w.resumed);
    case 'confirming':
    case 'asking':
      return reAsk(step, ctx, w.resumed);
    case 'offering':
      return goToEnd(step, ctx, w.resumed);
  }
}

// The interpreter builds its lexicon on first use (about 0.1 s): the runner calls this while the first
// prompt is being said, so the driver's first answer is not the one that waits.
export function warmVoiceLoop(locale: Locale): void {
  const heard = [{ transcript: locale === 'es' ? 'bien' : 'good', confidence: 1 }];
  interpretUtterance(heard, { type: 'check' }, locale);
  interpretConfirmation(heard, locale);
}

export function reduceVoiceLoop(state: VoiceLoopState, event: VoiceLoopEvent, ctx: VoiceLoopContext): VoiceLoopStep {
  const step = new Step(state);
  switch (event.type) {
    case 'start':
      return onStart(step, ctx).done();
    case 'heard':
      return onHeard(step, ctx, event.alternatives, event.at).done();
    case 'silence':
      return onSilence(step, ctx).done();
    case 'speech_error':
      return onSpeechError(step, event).done();
    case 'command': {
      if (!['asking', 'confirming', 'offering'].includes(state.phase)) {
        // Buttons work as the voice would: resume from a pause, end a note.
        if (state.phase === 'paused' && event.command === 'resume') {
          return backToWhereWeWere(step, ctx, state.returnTo, words(state).resuming).done();
        }
        if (state.phase === 'noting' && event.command === 'end_note') {
          const heard = (state.noteHeard ?? []).join(' ');
          step.set({ noteHeard: null }).emit({ type: 'stopNote', itemKey: state.itemKey, heard });
          return backToWhereWeWere(step, ctx, state.returnTo, words(state).noteSaved).done();
        }
        return step.done();
      }
      return command(step, ctx, event.command, '').done();
    }
    case 'jump': {
      // A note in progress is ended by its own words or button first; a finished walk-around is closed.
      if (state.phase === 'noting' || state.phase === 'finished') return step.done();
      const index = checklistOf(state, ctx).items.findIndex((item) => item.key === event.itemKey);
      if (index < 0) return step.done();
      // Leaving a round of revisiting: after this item the walk-around carries on in order.
      step.set({ review: null });
      return arrive(step, index, ctx, [], true).done();
    }
    case 'set_locale':
      if (state.phase === 'idle' || state.phase === 'finished') {
        return step.set({ locale: event.locale }).emit({ type: 'setLocale', locale: event.locale }).done();
      }
      return switchLocale(step, ctx, event.locale).done();
  }
}

// ---------------------------------------------------------------------------------------------------
// Storing and restoring.

export function serializeVoiceLoop(state: VoiceLoopState): string {
  return JSON.stringify(state);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

// Null when the stored text is not a loop state for this checklist; the host then starts afresh.
export function restoreVoiceLoop(stored: string, checklist: Checklist): VoiceLoopState | null {
  let parsed: unknown;
  try {
    parsed = JSON.parse(stored);
  } catch {
    return null;
  }
  if (!isRecord(parsed) || parsed.version !== VOICE_LOOP_VERSION) return null;
  if (typeof parsed.phase !== 'string' || !(VOICE_LOOP_PHASES as readonly string[]).includes(parsed.phase)) return null;
  if (!isRecord(parsed.results) || !Array.isArray(parsed.skipped)) return null;
  const state = parsed as unknown as VoiceLoopState;
  const index = checklist.items.findIndex((item) => item.key === state.itemKey);
  if (index < 0) return null;
  const keys = new Set(checklist.items.map((item) => item.key));
  if (!Object.keys(state.results).every((key) => keys.has(key))) return null;
  return { ...state, index };
}
