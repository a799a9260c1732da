// The hands-free walk-around as one typed reducer: (state, event) -> next state + effects to run.
//
// Why a hand-written reducer and not a state-machine library: the loop has a handful of phases whose
// transitions all pass through the same few steps (ask, interpret, confirm, save, next), and its
// state must be plain JSON so the host can store it and resume after a reload or an app switch.
// A pure function over plain data gives that for free, runs in unit tests without a browser or a
// timer, and adds nothing to the driver's bundle. Effects (speak, listen, save, notes, finish) are
// returned as data; the runner executes them against a SpeechEngine.
//
// The walk-around goes stop by stop (a wheel end, a brake, the rear lamps): one prompt names what to
// check there and one answer covers it, while every item still gets its own result. "One by one"
// walks a stop item by item; a reading the organisation requires, an item named without being sure
// which, and an out-of-limit value are asked about on their own.
//
// Safety: an unclear answer is never a pass. It is asked again, then the choices are offered, then
// the loop waits quietly for "resume"; a value past its limit is confirmed before it is kept, and is
// kept as a defect. The app supports and does not replace the driver's judgement; the limits are
// minimums and local rules, the maker's specifications and licensed practice govern.
import {
  LimitError,
  confirmKeptPrompt,
  confirmOutOfLimitPrompt,
  evaluateMeasurement,
  fixNeedsReading,
  interpretConfirmation,
  interpretFix,
  interpretStopAnswer,
  interpretUtterance,
  isReadingRequired,
  itemsNamedIn,
  languageSwitchedPrompt,
  measurementToWords,
  readBackMeasurement,
  splitEndNote,
  unclearPrompt,
  verdictWords,
  type Alternative,
  type Checklist,
  type ChecklistItem,
  type ChecklistStop,
  type Command,
  type ItemResult,
  type Locale,
  type MeasurementVerdict,
  type ReadingRule,
  type SpokenFix,
  type SpokenMeasurement,
  type StopMark,
  type UnclearReason,
  type Verdict,
} from '@yardcall/shared';
import { VOICE_LOOP_WORDS, fillWords } from './voice-loop-words';

export const VOICE_LOOP_VERSION = 2;

// A question is out: a stop or an item, a value to keep, which item was meant, what was skipped.
const QUESTION_PHASES = ['asking', 'confirming', 'choosing', 'offering'] as const;
// The loop waits: for "resume", for the end of a note, after speech failed.
const WAITING_PHASES = ['paused', 'noting', 'stalled'] as const;
export const VOICE_LOOP_PHASES = ['idle', ...QUESTION_PHASES, ...WAITING_PHASES, 'finished'] as const;
export type VoiceLoopPhase = (typeof VOICE_LOOP_PHASES)[number];

// Where to return after a pause, a wait, a note or a speech failure: the question that was out.
type ReturnPhase = (typeof QUESTION_PHASES)[number];

// What a "yes" keeps: one value past its limit or heard with low confidence, or a whole stop's answer
// heard with low confidence.
export interface PendingKeep {
  // The item a value belongs to; null for a whole stop's answer.
  itemKey: string | null;
  results: ItemResult[];
  measurement: SpokenMeasurement | null;
  verdict: Verdict | null;
  say: string | null;
  // True when the value is the new reading of a fix on the spot.
  fix: SpokenFix | null;
  heard: string;
  // What was said to confirm it, for "repeat".
  question: string;
}

// A problem named at a stop without saying which item it is.
export interface PendingWhich {
  detail: string;
  candidates: string[];
  heard: string;
  at: string;
}

// An item asked on its own within a stop: `reading` when the driver passed it by eye and the
// organisation requires the reading.
export interface QueuedItem {
  key: string;
  reading: boolean;
}

export interface VoiceLoopState {
  version: typeof VOICE_LOOP_VERSION;
  locale: Locale;
  phase: VoiceLoopPhase;
  returnTo: ReturnPhase;
  // The current stop, by position and by key (the key survives a rebuilt checklist).
  stop: number;
  stopKey: string;
  // The current item: the one asked on its own, or the stop's first item when the stop is asked.
  index: number;
  itemKey: string;
  // Null while the stop is asked as a whole; else the item asked now and those still to ask.
  current: QueuedItem | null;
  queue: QueuedItem[];
  // After items asked out of turn (a jump, a correction), the stop to carry on at.
  resumeStop: number | null;
  results: Record<string, ItemResult>;
  // Skipped item keys in the order they were skipped.
  skipped: string[];
  // Keys being revisited at the end, in checklist order; null during the first pass.
  review: string[] | null;
  // Unclear answers and silent turns in a row, and reminders said since the last answer.
  unclear: number;
  silent: number;
  reminders: number;
  // The driver said "no gauge" for the current item: a pass now is a pass without a reading.
  gaugeless: boolean;
  pending: PendingKeep | null;
  which: PendingWhich | null;
  // The defect the last answer recorded: "fixed" and a note said next apply to it. The next answer
  // that records no defect clears it.
  lastDefectKey: string | null;
  // An in-limit value said back at the start of the current prompt: "no" or "back" corrects it.
  saidBack: string | null;
  noteItemKey: string | null;
  noteHeard: string[] | null;
  cautionSpoken: boolean;
  fixHintSpoken: boolean;
  // How often each kind of stop was announced in full; short prompts after a few.
  kindCounts: Record<string, number>;
  lastError: string | null;
}

export type VoiceLoopEvent =
  // Begin, or resume after a restore or a speech failure: re-says the current prompt.
  | { type: 'start' }
  | { type: 'heard'; alternatives: Alternative[]; at: string }
  // The turn ended with nothing heard (silence or the turn's time-out).
  | { type: 'silence' }
  | { type: 'speech_error'; code: string; fatal: boolean; spoken: string; shown: string }
  // A button on the screen.
  | { type: 'command'; command: Exclude<Command, 'language'>; at: string }
  | { type: 'set_locale'; locale: Locale }
  // The screen's list: go to one item (a skipped one, or any to answer again) and ask it in full.
  | { type: 'jump'; itemKey: string }
  // The note reached its longest length.
  | { type: 'note_limit' };

export type ListenMode = 'answer' | 'confirm' | 'offer' | 'paused' | 'note';

export type VoiceLoopEffect =
  | { type: 'speak'; text: string; locale: Locale }
  | { type: 'listen'; locale: Locale; mode: ListenMode; timeoutMs: number; phrases: readonly string[] }
  | { type: 'save'; result: ItemResult }
  | { type: 'startNote'; itemKey: string; heard: string; maxMs: number }
  | { type: 'stopNote'; itemKey: string; heard: string }
  | { type: 'setLocale'; locale: Locale }
  | { type: 'speechFailed'; code: string; shown: string }
  | { type: 'finish'; results: ItemResult[]; notDone: string[] };

export interface VoiceLoopContext {
  // The same walk-around in each language the driver may switch to (item and stop keys are stable).
  checklistFor: (locale: Locale) => Checklist;
  // Readings the organisation requires; by default none.
  requiredReadings?: readonly ReadingRule[];
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
// Our own practice: a note longer than two minutes is a conversation, not a note.
export const NOTE_MAX_MS = 120_000;
// Short prompts once this many stops of a kind have been announced (the driver knows the drill by then).
export const SHORT_PROMPT_AFTER = 2;
// Never ask the same thing more than three times running: the prompt, then two more, then wait.
export const MAX_UNCLEAR = 3;
const SILENT_TURNS_BEFORE_REMINDER = 2;
const MAX_REMINDERS = 2;
// A recogniser's confidence under this is confirmed before it is kept (our own choice; 0 means the
// recogniser gave none).
export const LOW_CONFIDENCE = 0.5;
// Items named one by one in the offer of what is not done, and choices named when asking which.
const OFFER_LIST_LENGTH = 3;
const WHICH_LIST_LENGTH = 4;

export function initialVoiceLoopState(checklist: Checklist): VoiceLoopState {
  const stop = checklist.stops[0];
  return {
    version: VOICE_LOOP_VERSION,
    locale: checklist.locale,
    phase: 'idle',
    returnTo: 'asking',
    stop: 0,
    stopKey: stop?.key ?? '',
    index: 0,
    itemKey: checklist.items[0]?.key ?? '',
    current: null,
    queue: [],
    resumeStop: null,
    results: {},
    skipped: [],
    review: null,
    unclear: 0,
    silent: 0,
    reminders: 0,
    gaugeless: false,
    pending: null,
    which: null,
    lastDefectKey: null,
    saidBack: null,
    noteItemKey: null,
    noteHeard: null,
    cautionSpoken: false,
    fixHintSpoken: false,
    kindCounts: {},
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

type Prefix = (string | null | undefined)[];

function checklistOf(state: VoiceLoopState, ctx: VoiceLoopContext): Checklist {
  return ctx.checklistFor(state.locale);
}

function words(state: VoiceLoopState) {
  return VOICE_LOOP_WORDS[state.locale];
}

function itemByKey(checklist: Checklist, key: string): ChecklistItem | undefined {
  return checklist.items.find((item) => item.key === key);
}

function itemIndex(checklist: Checklist, key: string): number {
  return checklist.items.findIndex((item) => item.key === key);
}

function stopIndexOfItem(checklist: Checklist, key: string): number {
  const item = itemByKey(checklist, key);
  return item ? checklist.stops.findIndex((stop) => stop.key === item.stopKey) : -1;
}

function itemsOf(checklist: Checklist, stop: ChecklistStop): ChecklistItem[] {
  return stop.itemKeys.flatMap((key) => {
    const item = itemByKey(checklist, key);
    return item ? [item] : [];
  });
}

function currentStop(state: VoiceLoopState, ctx: VoiceLoopContext): ChecklistStop | undefined {
  return checklistOf(state, ctx).stops[state.stop];
}

function currentItem(state: VoiceLoopState, ctx: VoiceLoopContext): ChecklistItem | undefined {
  return itemByKey(checklistOf(state, ctx), state.itemKey);
}

function notDone(state: VoiceLoopState, checklist: Checklist): ChecklistItem[] {
  return checklist.items.filter((item) => !state.results[item.key]);
}

function withoutKeys(list: readonly string[], keys: readonly string[]): string[] {
  return list.filter((k) => !keys.includes(k));
}

function listenModeOf(phase: ReturnPhase): ListenMode {
  return phase === 'confirming' ? 'confirm' : phase === 'offering' ? 'offer' : 'answer';
}

function returnPhaseOf(phase: VoiceLoopPhase): ReturnPhase {
  return phase === 'confirming' || phase === 'choosing' || phase === 'offering' ? phase : 'asking';
}

function capitalise(text: string): string {
  return text.charAt(0).toLocaleUpperCase() + text.slice(1);
}

// "hub, lug nuts or rim"
function spokenList(state: VoiceLoopState, names: readonly string[]): string {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} ${words(state).or} ${names.at(-1) ?? ''}`;
}

function readingRequired(item: ChecklistItem, ctx: VoiceLoopContext): boolean {
  return item.expects.type === 'measure' && isReadingRequired(item, ctx.requiredReadings ?? []);
}

// A stop's kind for short prompts: what it checks, whatever its side or axle. A trailer's side with its
// reflective sheeting is a kind of its own; its wheel ends are the tractor's drill again.
function stopKind(checklist: Checklist, stop: ChecklistStop): string {
  return itemsOf(checklist, stop)
    .map((item) => item.name)
    .join('|');
}

function isLowConfidence(confidence: number | undefined): boolean {
  return confidence !== undefined && confidence > 0 && confidence < LOW_CONFIDENCE;
}

// The caution is said once per walk-around and always shown on the screen.
function caution(step: Step): string | null {
  if (step.state.cautionSpoken) return null;
  step.set({ cautionSpoken: true });
  return verdictWords(step.state.locale).verdicts.caution;
}

// ---------------------------------------------------------------------------------------------------
// Arriving at a stop, or at one item.

function resetTurn(step: Step): Step {
  return step.set({ unclear: 0, silent: 0, reminders: 0, pending: null, which: null, gaugeless: false });
}

// Moves to a stop and asks it as a whole; `full` says the whole prompt even when a short one would do.
function arriveStop(step: Step, stopIndex: number, ctx: VoiceLoopContext, prefix: Prefix = [], full = false): Step {
  const checklist = checklistOf(step.state, ctx);
  const stop = checklist.stops[stopIndex];
  if (!stop) return goToEnd(step, ctx, ...prefix);
  const previous = checklist.stops[step.state.stop];
  const newZone = step.state.phase === 'idle' || previous?.zone !== stop.zone || stopIndex === 0;
  const kind = stopKind(checklist, stop);
  const seen = step.state.kindCounts[kind] ?? 0;
  const short = !full && !newZone && seen >= SHORT_PROMPT_AFTER;
  const zoneTitle = newZone ? checklist.zones.find((z) => z.key === stop.zone)?.title : undefined;
  const first = stop.itemKeys[0] ?? '';
  resetTurn(step).set({
    phase: 'asking',
    stop: stopIndex,
    stopKey: stop.key,
    index: Math.max(0, itemIndex(checklist, first)),
    itemKey: first,
    current: null,
    queue: [],
    resumeStop: null,
    kindCounts: short ? step.state.kindCounts : { ...step.state.kindCounts, [kind]: seen + 1 },
  });
  return step
    .say(...prefix, zoneTitle ? `${zoneTitle}.` : null, short ? stop.shortPrompt : stop.prompt)
    .listen('answer');
}

// Asks one item on its own: briefly inside its stop, in full when arriving from elsewhere.
function arriveItem(
  step: Step,
  entry: QueuedItem,
  rest: QueuedItem[],
  ctx: VoiceLoopContext,
  prefix: Prefix = [],
  full = false,
): Step {
  const checklist = checklistOf(step.state, ctx);
  const item = itemByKey(checklist, entry.key);
  if (!item) return advance(step, ctx, ...prefix);
  const stopIndex = stopIndexOfItem(checklist, item.key);
  resetTurn(step).set({
    phase: 'asking',
    stop: stopIndex < 0 ? step.state.stop : stopIndex,
    stopKey: item.stopKey,
    index: itemIndex(checklist, item.key),
    itemKey: item.key,
    current: entry,
    queue: rest,
  });
  if (entry.reading)
    return step
      .say(...prefix, fillWords(words(step.state).readingRequired, { item: capitalise(item.name) }))
      .listen('answer');
  // Inside its stop the position was said with the stop: the item's name is enough.
  return step.say(...prefix, full ? item.prompt : `${capitalise(item.name)}?`).listen('answer');
}

// Says the current question again, in full, without counting it again.
function reAsk(step: Step, ctx: VoiceLoopContext, ...prefix: Prefix): Step {
  const { current, queue, stop } = step.state;
  if (current) return arriveItem(step, current, queue, ctx, prefix, true);
  const resume = step.state.resumeStop;
  arriveStop(step, stop, ctx, prefix, true);
  return step.set({ resumeStop: resume });
}

// What comes after the current question: the next item asked on its own, the next revisited item,
// the stop to carry on at, or the next stop.
function advance(step: Step, ctx: VoiceLoopContext, ...prefix: Prefix): Step {
  const { queue, review, itemKey, resumeStop, stop } = step.state;
  const [next, ...rest] = queue;
  if (next) return arriveItem(step, next, rest, ctx, prefix);
  if (review) {
    const nextKey = review[review.indexOf(itemKey) + 1];
    if (nextKey === undefined) return goToEnd(step, ctx, ...prefix);
    return arriveItem(step, { key: nextKey, reading: false }, [], ctx, prefix, true);
  }
  if (resumeStop !== null) return arriveStop(step, nextOpenStop(step.state, ctx, resumeStop), ctx, prefix, true);
  return arriveStop(step, nextOpenStop(step.state, ctx, stop + 1), ctx, prefix);
}

// The first stop from `from` on that still has an item without an answer.
function nextOpenStop(state: VoiceLoopState, ctx: VoiceLoopContext, from: number): number {
  const stops = checklistOf(state, ctx).stops;
  for (let i = Math.max(0, from); i < stops.length; i += 1) {
    if (stops[i]?.itemKeys.some((key) => !state.results[key])) return i;
  }
  return stops.length;
}

function goBack(step: Step, ctx: VoiceLoopContext): Step {
  const { review, itemKey, current, stop, saidBack } = step.state;
  const checklist = checklistOf(step.state, ctx);
  // A value just said back: "back" means that value was wrong.
  if (saidBack) return correctSaidBack(step, ctx);
  if (review) {
    const previousKey = review[review.indexOf(itemKey) - 1];
    if (previousKey === undefined) return reAsk(step, ctx, words(step.state).firstItem);
    return arriveItem(step, { key: previousKey, reading: false }, [], ctx, [], true);
  }
  if (step.state.phase === 'offering') return arriveStop(step, checklist.stops.length - 1, ctx, [], true);
  // Inside a stop walked item by item, back goes to the previous item of the stop.
  const stopItems = checklist.stops[stop]?.itemKeys ?? [];
  const position = current ? stopItems.indexOf(current.key) : -1;
  if (position > 0) {
    const previous = stopItems[position - 1] as string;
    const rest = stopItems.slice(position).map((key) => ({ key, reading: false }));
    return arriveItem(step, { key: previous, reading: false }, rest, ctx, [], true);
  }
  if (stop <= 0) return reAsk(step, ctx, words(step.state).firstItem);
  return arriveStop(step, stop - 1, ctx, [], true);
}

// "Back", or a lone "no", said right after a value was said back.
function correctsSaidBack(meaning: { kind: string; command?: string; reason?: string }): boolean {
  return (
    (meaning.kind === 'command' && meaning.command === 'back') ||
    (meaning.kind === 'unclear' && meaning.reason === 'ambiguous')
  );
}

// "No" or "back" right after a value was said back: ask that item again, then carry on here.
function correctSaidBack(step: Step, ctx: VoiceLoopContext): Step {
  const key = step.state.saidBack as string;
  const here = step.state.stop;
  const pendingQueue = step.state.current ? [step.state.current, ...step.state.queue] : [];
  arriveItem(step, { key, reading: false }, pendingQueue, ctx, [], true);
  return step.set({ resumeStop: pendingQueue.length > 0 ? null : here, saidBack: null });
}

function save(step: Step, results: readonly ItemResult[]): Step {
  if (results.length === 0) return step;
  const keys = results.map((r) => r.itemKey);
  const all = { ...step.state.results };
  for (const result of results) all[result.itemKey] = result;
  const defect = results.filter((r) => r.answer === 'defect' && !r.fixed).at(-1)?.itemKey ?? null;
  step.set({ results: all, skipped: withoutKeys(step.state.skipped, keys), lastDefectKey: defect });
  for (const result of results) step.emit({ type: 'save', result });
  return step;
}

function resultOf(
  item: ChecklistItem,
  answer: ItemResult['answer'],
  heard: string,
  confidence: number | undefined,
  at: string,
): ItemResult {
  const result: ItemResult = { itemKey: item.key, answer, heard, answeredAt: at };
  if (confidence !== undefined) result.confidence = confidence;
  return result;
}

function defectSentence(step: Step, ctx: VoiceLoopContext, keys: readonly string[]): string | null {
  if (keys.length === 0) return null;
  const checklist = checklistOf(step.state, ctx);
  const names = keys.map((key) => itemByKey(checklist, key)?.name ?? key);
  const w = words(step.state);
  const sentence =
    names.length === 1
      ? fillWords(w.defectNoted, { item: names[0] ?? '' })
      : fillWords(w.defectsNoted, { items: spokenList(step.state, names) });
  if (step.state.fixHintSpoken) return sentence;
  step.set({ fixHintSpoken: true });
  return `${sentence} ${w.fixHint}`;
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

function goToEnd(step: Step, ctx: VoiceLoopContext, ...prefix: Prefix): Step {
  const checklist = checklistOf(step.state, ctx);
  const open = notDone(step.state, checklist);
  if (open.length === 0) return finish(step, ctx, ...prefix);
  // A new offer starts a new round of revisiting.
  resetTurn(step).set({ phase: 'offering', review: null, current: null, queue: [], resumeStop: null });
  return step.say(...prefix, offerSentence(step.state, open)).listen('offer');
}

function finish(step: Step, ctx: VoiceLoopContext, ...prefix: Prefix): Step {
  const checklist = checklistOf(step.state, ctx);
  const open = notDone(step.state, checklist);
  const w = words(step.state);
  const sentence =
    open.length === 0
      ? fillWords(w.allDone, { count: checklist.items.length })
      : fillWords(w.finishingOpen, { count: open.length });
  step.set({ phase: 'finished', pending: null, which: null, review: null, current: null, queue: [] });
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
  return arriveItem(step, { key: first.key, reading: false }, [], ctx, [], true);
}

// ---------------------------------------------------------------------------------------------------
// Measurements: judge, keep or confirm, and say back.

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

function measuredResult(
  item: ChecklistItem,
  measurement: SpokenMeasurement,
  verdict: MeasurementVerdict | null,
  heard: string,
  confidence: number | undefined,
  at: string,
): ItemResult {
  const outOfLimit = verdict?.verdict === 'out_of_limit';
  const result = resultOf(item, outOfLimit ? 'defect' : 'pass', heard, confidence, at);
  result.measurement = { quantity: measurement.quantity, value: measurement.value, unit: measurement.unit };
  if (verdict) result.verdict = verdict.verdict;
  if (outOfLimit) result.detail = verdict.say;
  return result;
}

// What is said back about a kept value at the start of the next prompt.
function sayBack(step: Step, measurement: SpokenMeasurement, verdict: MeasurementVerdict | null): Prefix {
  if (verdict?.verdict === 'near_limit') return [verdict.say, caution(step)];
  return [`${capitalise(measurementToWords(measurement.said.value, measurement.said.unit, step.state.locale))}.`];
}

// A value for one item: a value past its limit or heard with low confidence is confirmed; an
// in-limit value is kept and said back at the start of the next prompt.
function takeMeasurement(
  step: Step,
  ctx: VoiceLoopContext,
  item: ChecklistItem,
  measurement: SpokenMeasurement,
  heard: string,
  confidence: number | undefined,
  at: string,
  fix: SpokenFix | null = null,
): Step {
  const { locale } = step.state;
  const verdict = judge(item, measurement, locale);
  if (verdict === 'implausible') return unclear(step, ctx, 'implausible');
  const result = measuredResult(item, measurement, verdict, heard, confidence, at);
  const outOfLimit = verdict?.verdict === 'out_of_limit';
  if (outOfLimit || isLowConfidence(confidence)) {
    const question = outOfLimit
      ? confirmOutOfLimitPrompt(measurement, verdict.say, locale)
      : readBackMeasurement(measurement, locale);
    step.set({
      phase: 'confirming',
      unclear: 0,
      silent: 0,
      reminders: 0,
      pending: {
        itemKey: item.key,
        results: [result],
        measurement,
        verdict: verdict?.verdict ?? null,
        say: verdict?.say ?? null,
        fix,
        heard,
        question,
      },
    });
    return step.say(question).listen('confirm');
  }
  if (fix) return recordFix(step, ctx, fix, heard, at, { measurement, verdict });
  save(step, [result]);
  const back = sayBack(step, measurement, verdict);
  advance(step, ctx, ...back);
  return step.set({ saidBack: item.key });
}

function keepPending(step: Step, ctx: VoiceLoopContext, at: string): Step {
  const { pending, locale } = step.state;
  if (!pending) return reAsk(step, ctx);
  step.set({ pending: null });
  if (pending.fix && pending.measurement) {
    return recordFix(step, ctx, pending.fix, pending.heard, at, {
      measurement: pending.measurement,
      verdict: pending.verdict ? { verdict: pending.verdict, say: pending.say ?? '' } : null,
    });
  }
  save(step, pending.results);
  const defects = pending.results.filter((r) => r.answer === 'defect').map((r) => r.itemKey);
  if (pending.verdict === 'out_of_limit' && pending.measurement) {
    return advance(
      step,
      ctx,
      confirmKeptPrompt(pending.measurement, locale),
      defectSentence(step, ctx, defects),
      caution(step),
    );
  }
  if (pending.verdict === 'near_limit') return advance(step, ctx, pending.say, caution(step));
  return advance(step, ctx, defectSentence(step, ctx, defects));
}

// ---------------------------------------------------------------------------------------------------
// Fixed on the spot.

function recordFix(
  step: Step,
  ctx: VoiceLoopContext,
  fix: SpokenFix,
  heard: string,
  at: string,
  reading: { measurement: SpokenMeasurement; verdict: Pick<MeasurementVerdict, 'verdict' | 'say'> | null } | null,
): Step {
  const checklist = checklistOf(step.state, ctx);
  const key = step.state.lastDefectKey;
  const item = key ? itemByKey(checklist, key) : undefined;
  const defect = key ? step.state.results[key] : undefined;
  const w = words(step.state);
  if (!item || defect?.answer !== 'defect')
    return backToWhereWeWere(step, ctx, returnPhaseOf(step.state.phase), w.nothingToFix);
  if (reading?.verdict?.verdict === 'out_of_limit') {
    return backToWhereWeWere(step, ctx, 'asking', fillWords(w.fixStillOut, { item: capitalise(item.name) }));
  }
  const fixed: NonNullable<ItemResult['fixed']> = { action: fix.action, heard, at };
  if (reading) {
    const { measurement, verdict } = reading;
    fixed.measurement = { quantity: measurement.quantity, value: measurement.value, unit: measurement.unit };
    if (verdict) fixed.verdict = verdict.verdict;
  }
  save(step, [{ ...defect, fixed }]);
  return backToWhereWeWere(step, ctx, 'asking', fillWords(w.fixedNoted, { item: item.name }));
}

// "Fixed, added air, now one ten": applies to the last defect; a new reading is judged like any other.
function applyFix(
  step: Step,
  ctx: VoiceLoopContext,
  fix: SpokenFix,
  heard: string,
  confidence: number | undefined,
  at: string,
): Step {
  const key = step.state.lastDefectKey;
  const item = key ? itemByKey(checklistOf(step.state, ctx), key) : undefined;
  if (item && fix.measurement) return takeMeasurement(step, ctx, item, fix.measurement, heard, confidence, at, fix);
  const defect = key ? step.state.results[key] : undefined;
  if (defect && fixNeedsReading(defect)) {
    return backToWhereWeWere(step, ctx, 'asking', words(step.state).fixNeedsReading);
  }
  return recordFix(step, ctx, fix, heard, at, null);
}

function fixHeard(
  step: Step,
  ctx: VoiceLoopContext,
  alternatives: readonly Alternative[],
): { fix: SpokenFix; heard: string; confidence?: number } | null {
  const key = step.state.lastDefectKey;
  if (!key) return null;
  const item = itemByKey(checklistOf(step.state, ctx), key);
  const quantity = item?.expects.type === 'measure' ? item.expects.quantity : undefined;
  const meaning = interpretFix(alternatives, quantity, step.state.locale);
  if (meaning?.kind !== 'fixed') return null;
  const fix: SpokenFix = { action: meaning.action };
  if (meaning.measurement) fix.measurement = meaning.measurement;
  return { fix, heard: meaning.heard, ...(meaning.confidence === undefined ? {} : { confidence: meaning.confidence }) };
}

// ---------------------------------------------------------------------------------------------------
// Unclear answers: ask again, then offer the choices, then wait. Never a pass.

function wait(step: Step, phase: ReturnPhase): Step {
  step.set({ phase: 'paused', returnTo: phase, unclear: 0, silent: 0, reminders: 0 });
  return step.say(words(step.state).waiting).listen('paused');
}

function choicesFor(state: VoiceLoopState, ctx: VoiceLoopContext, phase: ReturnPhase): string {
  const w = words(state);
  if (phase === 'confirming') return w.choicesConfirm;
  if (phase === 'offering') return w.choicesOffer;
  if (phase === 'choosing') return w.choicesWhich;
  if (!state.current) return w.choicesStop;
  return currentItem(state, ctx)?.expects.type === 'measure' ? w.choicesMeasure : w.choicesCheck;
}

function unclear(step: Step, ctx: VoiceLoopContext, reason: UnclearReason): Step {
  const count = step.state.unclear + 1;
  const phase = returnPhaseOf(step.state.phase);
  if (count >= MAX_UNCLEAR) return wait(step, phase);
  step.set({ unclear: count, silent: 0 });
  const mode = listenModeOf(phase);
  if (count >= 2 || phase !== 'asking') return step.say(choicesFor(step.state, ctx, phase)).listen(mode);
  return step.say(unclearPrompt(reason, step.state.locale)).listen(mode);
}

// ---------------------------------------------------------------------------------------------------
// Commands, the same at every point.

function whereSentence(state: VoiceLoopState, checklist: Checklist): string {
  const stop = checklist.stops[state.stop];
  if (!stop) return '';
  const item = itemByKey(checklist, state.itemKey);
  return fillWords(words(state).where, {
    zone: checklist.zones.find((z) => z.key === stop.zone)?.title ?? '',
    position: state.current && item ? `${item.positionLabel}, ${item.title}` : stop.label,
    n: state.stop + 1,
    total: checklist.stops.length,
    done: Object.keys(state.results).length,
  });
}

// What the driver hears again when returning to where they were.
function backToWhereWeWere(step: Step, ctx: VoiceLoopContext, phase: ReturnPhase, ...prefix: Prefix): Step {
  const { pending, which } = step.state;
  step.set({ silent: 0, reminders: 0 });
  if (phase === 'confirming' && pending) {
    step.set({ phase: 'confirming' });
    return step.say(...prefix, pending.question).listen('confirm');
  }
  if (phase === 'choosing' && which) {
    step.set({ phase: 'choosing' });
    return step.say(...prefix, whichQuestion(step.state, ctx, which)).listen('answer');
  }
  if (phase === 'offering') return goToEnd(step, ctx, ...prefix);
  return reAsk(step, ctx, ...prefix);
}

function command(step: Step, ctx: VoiceLoopContext, cmd: Exclude<Command, 'language'>, heard: string): Step {
  const { state } = step;
  const w = words(state);
  const phase = returnPhaseOf(state.phase);
  const checklist = checklistOf(state, ctx);
  switch (cmd) {
    case 'repeat':
    case 'resume':
      return backToWhereWeWere(step, ctx, phase);
    case 'back':
      // From a read-back or a question about one defect, back means "ask me this again".
      if (phase === 'confirming' || phase === 'choosing') return reAsk(step, ctx);
      return goBack(step, ctx);
    case 'skip': {
      if (phase === 'offering') return finish(step, ctx);
      const keys = state.current ? [state.current.key] : (checklist.stops[state.stop]?.itemKeys ?? []);
      const open = keys.filter((key) => !state.results[key] && !state.skipped.includes(key));
      step.set({ skipped: [...state.skipped, ...open] });
      return advance(step, ctx, w.skipped);
    }
    case 'pause':
      step.set({ phase: 'paused', returnTo: phase, silent: 0 });
      return step.say(w.paused).listen('paused');
    case 'note': {
      // A note belongs to the item asked on its own, else to the defect just recorded (the driver
      // describes it as the next prompt starts), else to the stop's first item.
      const noteItemKey = state.current?.key ?? state.lastDefectKey ?? state.itemKey;
      step.set({ phase: 'noting', returnTo: phase, noteHeard: [], noteItemKey, silent: 0 });
      // Said before the recording starts, so the note does not begin with our own voice.
      return step
        .say(w.noteStarted)
        .emit({ type: 'startNote', itemKey: noteItemKey, heard, maxMs: NOTE_MAX_MS })
        .listen('note');
    }
    case 'end_note':
      // Not recording: nothing to end.
      return step.listen(listenModeOf(phase));
    case 'help':
      return step.say(w.help, choicesFor(state, ctx, phase)).listen(listenModeOf(phase));
    case 'where':
      return step.say(whereSentence(state, checklist)).listen(listenModeOf(phase));
    case 'finish':
      if (phase === 'offering') return finish(step, ctx);
      return goToEnd(step, ctx);
    case 'one_by_one': {
      const stop = checklist.stops[state.stop];
      if (!stop || state.current) return backToWhereWeWere(step, ctx, phase);
      const [first, ...rest] = stop.itemKeys.map((key) => ({ key, reading: false }));
      if (!first) return advance(step, ctx);
      return arriveItem(step, first, rest, ctx, [w.oneByOne]);
    }
  }
}

function switchLocale(step: Step, ctx: VoiceLoopContext, locale: Locale): Step {
  const returnPhase = returnPhaseOf(step.state.phase);
  step.set({ locale }).emit({ type: 'setLocale', locale });
  // A pending question was said in the old language: ask again in the new one.
  if (returnPhase === 'confirming' || returnPhase === 'choosing')
    return reAsk(step, ctx, languageSwitchedPrompt(locale));
  return backToWhereWeWere(step, ctx, returnPhase, languageSwitchedPrompt(locale));
}

function endNote(step: Step, ctx: VoiceLoopContext, lastWords: string | null, ...prefix: Prefix): Step {
  const { noteHeard, noteItemKey, itemKey, returnTo } = step.state;
  const all = [...(noteHeard ?? []), ...(lastWords ? [lastWords] : [])].join(' ').trim();
  step
    .set({ noteHeard: null, noteItemKey: null })
    .emit({ type: 'stopNote', itemKey: noteItemKey ?? itemKey, heard: all });
  return backToWhereWeWere(step, ctx, returnTo, ...prefix);
}

// ---------------------------------------------------------------------------------------------------
// What was heard, by phase.

function bestAlternative(alternatives: readonly Alternative[]): Alternative | undefined {
  return [...alternatives].sort((a, b) => (b.confidence ?? -1) - (a.confidence ?? -1))[0];
}

function commandOrLanguage(
  step: Step,
  ctx: VoiceLoopContext,
  meaning: { kind: 'command'; command: Command; heard: string; locale?: Locale },
): Step {
  if (meaning.command === 'language') return meaning.locale ? switchLocale(step, ctx, meaning.locale) : step;
  return command(step, ctx, meaning.command, meaning.heard);
}

// "Which one? Hub, lug nuts, rim, or another?" The driver's own words stay on the screen.
function whichQuestion(state: VoiceLoopState, ctx: VoiceLoopContext, which: PendingWhich): string {
  const checklist = checklistOf(state, ctx);
  const w = words(state);
  const names = which.candidates.slice(0, WHICH_LIST_LENGTH).map((key) => itemByKey(checklist, key)?.name ?? key);
  if (which.candidates.length > WHICH_LIST_LENGTH) names.push(w.another);
  return fillWords(w.whichOne, { list: capitalise(spokenList(state, names)) });
}

function askWhich(step: Step, ctx: VoiceLoopContext, which: PendingWhich): Step {
  resetTurn(step).set({ phase: 'choosing', which });
  return step.say(whichQuestion(step.state, ctx, which)).listen('answer');
}

// One answer for a whole stop.
function onStopAnswer(
  step: Step,
  ctx: VoiceLoopContext,
  stop: ChecklistStop,
  alternatives: Alternative[],
  at: string,
): Step {
  const checklist = checklistOf(step.state, ctx);
  const { locale } = step.state;
  const items = itemsOf(checklist, stop);
  const fix = fixHeard(step, ctx, alternatives);
  if (fix) return applyFix(step, ctx, fix.fix, fix.heard, fix.confidence, at);
  const meaning = interpretStopAnswer(
    alternatives,
    items.map((item) => ({ key: item.key, names: item.names, expects: item.expects })),
    locale,
  );
  const saidBack = step.state.saidBack;
  step.set({ saidBack: null });
  if (saidBack && correctsSaidBack(meaning)) return correctSaidBack(step.set({ saidBack }), ctx);
  switch (meaning.kind) {
    case 'command':
      return commandOrLanguage(step, ctx, meaning);
    case 'unclear':
      return unclear(step, ctx, meaning.reason);
    case 'fixed':
      return backToWhereWeWere(step, ctx, 'asking', words(step.state).nothingToFix);
    case 'which': {
      const candidates = meaning.candidates.length > 0 ? meaning.candidates : stop.itemKeys;
      if (candidates.length === 1) {
        const marks: StopMark[] = [{ itemKey: candidates[0] as string, answer: 'defect', detail: meaning.detail }];
        return keepStopAnswer(step, ctx, stop, marks, meaning.heard, meaning.confidence, at);
      }
      return askWhich(step, ctx, { detail: meaning.detail, candidates, heard: meaning.heard, at });
    }
    case 'stop':
      return keepStopAnswer(step, ctx, stop, meaning.marks, meaning.heard, meaning.confidence, at);
  }
}

// Every item of the stop gets its result: named ones as named, the rest pass. Values past their
// limit, readings the organisation requires and a low-confidence answer are asked about first.
function keepStopAnswer(
  step: Step,
  ctx: VoiceLoopContext,
  stop: ChecklistStop,
  marks: readonly StopMark[],
  heard: string,
  confidence: number | undefined,
  at: string,
): Step {
  const checklist = checklistOf(step.state, ctx);
  const { locale } = step.state;
  const results: ItemResult[] = [];
  const later: QueuedItem[] = [];
  const spoken: Prefix = [];
  let risky: { item: ChecklistItem; measurement: SpokenMeasurement } | null = null;
  for (const item of itemsOf(checklist, stop)) {
    const mark = marks.find((m) => m.itemKey === item.key);
    if (mark?.answer === 'defect') {
      const defect = resultOf(item, 'defect', heard, confidence, at);
      if (mark.detail.trim() !== '') defect.detail = mark.detail;
      results.push(defect);
    } else if (mark?.answer === 'not_applicable') {
      results.push(resultOf(item, 'not_applicable', heard, confidence, at));
    } else if (mark?.answer === 'measurement') {
      const verdict = judge(item, mark.measurement, locale);
      if (verdict === 'implausible') later.push({ key: item.key, reading: false });
      else if (verdict?.verdict === 'out_of_limit' && !risky) risky = { item, measurement: mark.measurement };
      else if (verdict?.verdict === 'out_of_limit') later.push({ key: item.key, reading: false });
      else {
        results.push(measuredResult(item, mark.measurement, verdict, heard, confidence, at));
        spoken.push(...sayBack(step, mark.measurement, verdict));
      }
    } else if (readingRequired(item, ctx)) {
      later.push({ key: item.key, reading: true });
    } else {
      const pass = resultOf(item, 'pass', heard, confidence, at);
      if (item.expects.type === 'measure') pass.noReading = 'visual';
      results.push(pass);
    }
  }
  const defects = results.filter((r) => r.answer === 'defect').map((r) => r.itemKey);
  if (isLowConfidence(confidence) && !risky) {
    const question = fillWords(words(step.state).heardGroup, { heard });
    resetTurn(step).set({
      phase: 'confirming',
      queue: later,
      pending: { itemKey: null, results, measurement: null, verdict: null, say: null, fix: null, heard, question },
    });
    return step.say(question).listen('confirm');
  }
  save(step, results);
  const measured = results.filter((r) => r.measurement && r.answer === 'pass').at(-1)?.itemKey ?? null;
  const prefix: Prefix = [...spoken, defectSentence(step, ctx, defects)];
  if (risky) {
    const rest = later;
    step.set({ queue: rest, current: { key: risky.item.key, reading: false }, itemKey: risky.item.key });
    if (prefix.some(Boolean)) step.say(...prefix);
    return takeMeasurement(step, ctx, risky.item, risky.measurement, heard, confidence, at);
  }
  step.set({ queue: later, current: null });
  advance(step, ctx, ...prefix);
  return step.set({ saidBack: measured });
}

// One item asked on its own.
function onItemAnswer(
  step: Step,
  ctx: VoiceLoopContext,
  item: ChecklistItem,
  alternatives: Alternative[],
  at: string,
): Step {
  const { locale, current } = step.state;
  const fix = fixHeard(step, ctx, alternatives);
  if (fix) return applyFix(step, ctx, fix.fix, fix.heard, fix.confidence, at);
  const meaning = interpretUtterance(alternatives, item.expects, locale);
  const saidBack = step.state.saidBack;
  step.set({ saidBack: null });
  if (saidBack && correctsSaidBack(meaning)) return correctSaidBack(step.set({ saidBack }), ctx);
  switch (meaning.kind) {
    case 'command':
      if (meaning.command === 'one_by_one') return backToWhereWeWere(step, ctx, 'asking');
      return commandOrLanguage(step, ctx, meaning);
    case 'unclear':
      return unclear(step, ctx, meaning.reason);
    case 'fixed':
      return backToWhereWeWere(step, ctx, 'asking', words(step.state).nothingToFix);
    case 'no_gauge':
      if (item.expects.type !== 'measure') return unclear(step, ctx, 'not_understood');
      // Already passed by eye: the required reading could not be taken.
      if (current?.reading) return keepPass(step, ctx, item, 'no_gauge', meaning.heard, meaning.confidence, at);
      step.set({ gaugeless: true, unclear: 0 });
      return step.say(words(step.state).byEye).listen('answer');
    case 'measurement':
      return takeMeasurement(step, ctx, item, meaning.measurement, meaning.heard, meaning.confidence, at);
    case 'answer': {
      if (meaning.answer === 'pass' && item.expects.type === 'measure') {
        if (step.state.gaugeless) return keepPass(step, ctx, item, 'no_gauge', meaning.heard, meaning.confidence, at);
        if (readingRequired(item, ctx)) {
          // Counted as unclear so "good" to a required reading cannot loop.
          const count = step.state.unclear + 1;
          if (count >= MAX_UNCLEAR) return wait(step, 'asking');
          step.set({ unclear: count, current: { key: item.key, reading: true } });
          return step
            .say(fillWords(words(step.state).readingRequired, { item: capitalise(item.name) }))
            .listen('answer');
        }
        return keepPass(step, ctx, item, 'visual', meaning.heard, meaning.confidence, at);
      }
      const result = resultOf(item, meaning.answer, meaning.heard, meaning.confidence, at);
      if (meaning.answer === 'defect' && meaning.detail) result.detail = meaning.detail;
      save(step, [result]);
      if (meaning.answer !== 'defect') return advance(step, ctx);
      return advance(step, ctx, defectSentence(step, ctx, [item.key]));
    }
  }
}

function keepPass(
  step: Step,
  ctx: VoiceLoopContext,
  item: ChecklistItem,
  noReading: 'visual' | 'no_gauge',
  heard: string,
  confidence: number | undefined,
  at: string,
): Step {
  const result = resultOf(item, 'pass', heard, confidence, at);
  if (item.expects.type === 'measure') result.noReading = noReading;
  save(step, [result]);
  return advance(step, ctx);
}

// The driver says which item a problem named at a stop belongs to.
function onWhich(step: Step, ctx: VoiceLoopContext, which: PendingWhich, alternatives: Alternative[]): Step {
  const checklist = checklistOf(step.state, ctx);
  const stop = checklist.stops[step.state.stop];
  const best = bestAlternative(alternatives);
  const candidates = which.candidates.flatMap((key) => {
    const item = itemByKey(checklist, key);
    return item ? [{ key: item.key, names: [item.name, ...item.names], expects: item.expects }] : [];
  });
  const named = best ? itemsNamedIn(best.transcript, candidates, step.state.locale) : [];
  if (named.length === 1 && stop) {
    const marks: StopMark[] = [{ itemKey: named[0] as string, answer: 'defect', detail: which.detail }];
    step.set({ which: null });
    return keepStopAnswer(step, ctx, stop, marks, which.heard, undefined, which.at);
  }
  const meaning = interpretUtterance(alternatives, { type: 'check' }, step.state.locale);
  if (meaning.kind === 'command') return commandOrLanguage(step, ctx, meaning);
  return unclear(step, ctx, named.length > 1 ? 'disagreement' : 'not_understood');
}

function onHeard(step: Step, ctx: VoiceLoopContext, alternatives: Alternative[], at: string): Step {
  const { state } = step;
  step.set({ silent: 0, reminders: 0, lastError: null });
  const checklist = checklistOf(state, ctx);
  switch (state.phase) {
    case 'asking': {
      if (state.current) {
        const item = itemByKey(checklist, state.current.key);
        if (!item) return advance(step, ctx);
        return onItemAnswer(step, ctx, item, alternatives, at);
      }
      const stop = checklist.stops[state.stop];
      if (!stop) return goToEnd(step, ctx);
      return onStopAnswer(step, ctx, stop, alternatives, at);
    }
    case 'choosing':
      if (!state.which) return reAsk(step, ctx);
      return onWhich(step, ctx, state.which, alternatives);
    case 'confirming': {
      const pending = state.pending;
      if (!pending) return reAsk(step, ctx);
      const answer = interpretConfirmation(alternatives, state.locale, pending.measurement ?? undefined);
      switch (answer.kind) {
        case 'confirm':
          return keepPending(step, ctx, at);
        case 'correct': {
          const item = pending.itemKey ? itemByKey(checklist, pending.itemKey) : undefined;
          if (answer.measurement && item) {
            step.set({ pending: null });
            return takeMeasurement(
              step,
              ctx,
              item,
              answer.measurement,
              answer.heard,
              answer.confidence,
              at,
              pending.fix,
            );
          }
          // "No" to a whole stop's answer, or to a value without a new one: ask again.
          step.set({ pending: null });
          if (item && !pending.fix) {
            arriveItem(step, { key: item.key, reading: false }, step.state.queue, ctx, [], true);
            return step;
          }
          return reAsk(step, ctx, item ? words(state).sayValueAgain : null);
        }
        case 'command':
          return command(step, ctx, answer.command, answer.heard);
        case 'unclear': {
          // "Español" while confirming: the language switch is a command too.
          const meaning = interpretUtterance(alternatives, { type: 'check' }, state.locale);
          if (meaning.kind === 'command' && meaning.command === 'language')
            return switchLocale(step, ctx, meaning.locale);
          return unclear(step, ctx, answer.reason);
        }
      }
      break;
    }
    case 'offering': {
      const answer = interpretConfirmation(alternatives, state.locale);
      if (answer.kind === 'confirm') return startReview(step, ctx);
      if (answer.kind === 'correct') return finish(step, ctx);
      const meaning = interpretUtterance(alternatives, { type: 'check' }, state.locale);
      if (meaning.kind === 'command') return commandOrLanguage(step, ctx, meaning);
      return unclear(step, ctx, 'not_understood');
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
      const best = bestAlternative(alternatives);
      const { words: said, ended } = splitEndNote(best?.transcript ?? '', state.locale);
      if (ended) return endNote(step, ctx, said === '' ? null : said, words(state).noteSaved);
      step.set({ noteHeard: [...(state.noteHeard ?? []), said] });
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
    case 'choosing':
    case 'offering': {
      const phase = returnPhaseOf(state.phase);
      const silent = state.silent + 1;
      // The driver is working: stay quiet, and only remind them now and then, then wait.
      if (silent < SILENT_TURNS_BEFORE_REMINDER) {
        step.set({ silent });
        return step.listen(listenModeOf(phase));
      }
      if (state.reminders >= MAX_REMINDERS) return wait(step, phase);
      step.set({ silent: 0, reminders: state.reminders + 1 });
      if (phase === 'asking') {
        const reminder = state.current ? currentItem(state, ctx)?.shortPrompt : currentStop(state, ctx)?.shortPrompt;
        return step.say(reminder).listen('answer');
      }
      const reminders = step.state.reminders;
      backToWhereWeWere(step, ctx, phase);
      return step.set({ reminders });
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
    const returnTo = state.phase === 'paused' || state.phase === 'noting' ? state.returnTo : returnPhaseOf(state.phase);
    step.set({ phase: 'stalled', returnTo, lastError: event.code });
    return step.say(event.spoken).emit({ type: 'speechFailed', code: event.code, shown: event.shown });
  }
  // Said once per kind of failure, then retried quietly.
  const first = state.lastError !== event.code;
  step.set({ lastError: event.code });
  if (first) step.say(event.spoken);
  const mode: ListenMode =
    state.phase === 'paused' ? 'paused' : state.phase === 'noting' ? 'note' : listenModeOf(returnPhaseOf(state.phase));
  return step.listen(mode);
}

function onStart(step: Step, ctx: VoiceLoopContext): Step {
  const { state } = step;
  const w = words(state);
  const checklist = checklistOf(state, ctx);
  switch (state.phase) {
    case 'idle':
      return arriveStop(step, state.stop, ctx, [fillWords(w.intro, { count: checklist.stops.length })]);
    case 'finished':
      return step;
    case 'paused':
      return step.say(w.paused).listen('paused');
    case 'noting':
      // The recording did not survive the interruption: back to the question.
      step.set({ noteHeard: null, noteItemKey: null });
      return backToWhereWeWere(step, ctx, state.returnTo, w.resumed);
    case 'stalled':
      step.set({ lastError: null });
      return backToWhereWeWere(step, ctx, state.returnTo, w.resumed);
    case 'confirming':
    case 'choosing':
    case 'asking':
      return backToWhereWeWere(step, ctx, returnPhaseOf(state.phase), w.resumed);
    case 'offering':
      return goToEnd(step, ctx, w.resumed);
  }
}

// The interpreter builds its lexicon on first use (about 0.1 s): the runner calls this while the first
// prompt is being said, so the driver's first answer is not the one that waits.
export function warmVoiceLoop(locale: Locale): void {
  const heard = [{ transcript: locale === 'es' ? 'bien' : 'good', confidence: 1 }];
  interpretUtterance(heard, { type: 'check' }, locale);
  interpretStopAnswer(heard, [], locale);
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
    case 'note_limit':
      if (state.phase !== 'noting') return step.done();
      return endNote(step, ctx, null, words(state).noteLimit).done();
    case 'command': {
      if (state.phase === 'paused' && event.command === 'resume') {
        // A tap or a headset button goes on after a pause or a wait.
        return backToWhereWeWere(step, ctx, state.returnTo, words(state).resuming).done();
      }
      if (state.phase === 'noting' && event.command === 'end_note') {
        return endNote(step, ctx, null, words(state).noteSaved).done();
      }
      if (!['asking', 'confirming', 'choosing', 'offering'].includes(state.phase)) return step.done();
      return command(step, ctx, event.command, '').done();
    }
    case 'jump': {
      // A note in progress is ended by its own words or button first; a finished walk-around is closed.
      if (state.phase === 'noting' || state.phase === 'finished') return step.done();
      const checklist = checklistOf(state, ctx);
      if (itemIndex(checklist, event.itemKey) < 0) return step.done();
      // Leaving a round of revisiting: after this item the walk-around carries on where it was.
      const here = state.phase === 'offering' ? null : state.stop;
      step.set({ review: null });
      arriveItem(step, { key: event.itemKey, reading: false }, [], ctx, [], true);
      return step.set({ resumeStop: here }).done();
    }
    case 'set_locale':
      if (state.phase === 'idle' || state.phase === 'finished') {
        return step.set({ locale: event.locale }).emit({ type: 'setLocale', locale: event.locale }).done();
      }
      return switchLocale(step, ctx, event.locale).done();
  }
}

// ---------------------------------------------------------------------------------------------------
// Restoring: the state is plain JSON, stored as it is.

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

// Null when the stored value is not a loop state for this checklist; the host then starts afresh.
// `saved` are the answers the phone's store holds: they are the record. The state is stored as each
// step begins, so a reload can catch it ahead of the answers it names; those items are asked again.
export function restoreVoiceLoop(
  stored: unknown,
  checklist: Checklist,
  saved?: readonly ItemResult[],
): VoiceLoopState | null {
  if (!isRecord(stored) || stored.version !== VOICE_LOOP_VERSION) return null;
  if (typeof stored.phase !== 'string' || !(VOICE_LOOP_PHASES as readonly string[]).includes(stored.phase)) return null;
  if (!isRecord(stored.results) || !Array.isArray(stored.skipped) || !Array.isArray(stored.queue)) return null;
  const state = stored as unknown as VoiceLoopState;
  const stop = checklist.stops.findIndex((s) => s.key === state.stopKey);
  const index = checklist.items.findIndex((item) => item.key === state.itemKey);
  if (stop < 0 || index < 0) return null;
  const keys = new Set(checklist.items.map((item) => item.key));
  if (!Object.keys(state.results).every((key) => keys.has(key))) return null;
  const results = saved ? Object.fromEntries(saved.map((result) => [result.itemKey, result])) : state.results;
  return { ...state, stop, index, results };
}
