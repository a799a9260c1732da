// One answer for a stop's group of items: "good", "good except the hub is leaking and a lug nut is
// loose", "defect, chafed air line", "good, ten thirty-seconds". Items the answer does not mark pass.
import type { Locale } from '../checklist/index.js';
import { normaliseText, originalWords, sliceText, type NormalisedText } from '../text/index.js';
import { findNumbers, type NumberSpan } from '../numbers/index.js';
import { QUANTITIES, type Quantity } from '../units/index.js';
import { classifyWords, withoutFillers, type WordItem, type WordsVerdict } from './classify-words.js';
import type { CompiledLexicon } from './compiled-lexicon.js';
import { disagreement, openAnswer, opposed, ranked, saysNoGauge, type Stance } from './interpret-utterance.js';
import { PhraseMatcher, type PhraseMatch } from '../text/index.js';
import { readFix, type FixReading } from './read-fix.js';
import { applyHomophones, correctedFrom, readMeasurement } from './read-measurement.js';
import type {
  Alternative,
  SpokenMeasurement,
  StopInterpretation,
  StopItemRef,
  StopMark,
  UnclearReason,
} from './types.js';

// Pressures said without a unit below this are not tire or air pressures a driver reads out (a
// truck tire in service runs far above it): a bare "ten" at a wheel end is a tread depth. Common
// practice, not a published value.
const LOWEST_BARE_PRESSURE_PSI = 30;
const PRESSURES: ReadonlySet<Quantity> = new Set(['tire_pressure', 'air_pressure']);

// Only to tell apart two quantities a value could be, never to judge it (the limits do that).
const USUAL_RANGES: Partial<Record<Quantity, { min: number; max: number }>> = {
  lining_thickness: { min: 0, max: 1 }, // in; new drum linings are about 3/4 in (from memory)
  pushrod_stroke: { min: 0.75, max: 4 }, // in; applied strokes are read about 1-2 1/2 in (common practice, from memory)
};

function isUsual(quantity: Quantity, value: number): boolean {
  const range = USUAL_RANGES[quantity];
  return range === undefined || (value >= range.min && value <= range.max);
}

// Stops repeat all through a walk-around: keep their compiled names, a few at a time.
const NAME_CACHE_LIMIT = 64;

interface StopNames {
  locale: Locale;
  matcher: PhraseMatcher<number[]>;
  // Every stem of every name of each item, to tell which item a run of names points at.
  stems: ReadonlySet<string>[];
}

const nameCache = new Map<string, StopNames>();
// The voice loop asks about one stop's items many times over: skip even building the key.
const namesByItems = new WeakMap<readonly StopItemRef[], StopNames>();

// Matches the words that point at the stop's items; a phrase several items share ("tire" at a
// dual) points at all of them.
function stopNames(items: readonly StopItemRef[], locale: Locale): StopNames {
  const known = namesByItems.get(items);
  if (known?.locale === locale) return known;
  const cacheKey = `${locale}\u0000${items.map((item) => `${item.key}\u0001${item.names.join('\u0002')}`).join('\u0003')}`;
  const cached = nameCache.get(cacheKey);
  if (cached) {
    namesByItems.set(items, cached);
    return cached;
  }
  const byStems = new Map<string, { phrase: string; indices: number[] }>();
  const stems = items.map(() => new Set<string>());
  items.forEach((item, index) => {
    for (const phrase of item.names) {
      const phraseStems = normaliseText(phrase, locale).stems;
      if (phraseStems.length === 0) continue;
      for (const stem of phraseStems) stems[index]?.add(stem);
      const entry = byStems.get(phraseStems.join(' ')) ?? { phrase, indices: [] };
      if (!entry.indices.includes(index)) entry.indices.push(index);
      byStems.set(phraseStems.join(' '), entry);
    }
  });
  const matcher = new PhraseMatcher<number[]>(
    locale,
    [...byStems.values()].map(({ phrase, indices }) => ({ category: indices, phrases: [phrase] })),
  );
  const compiled = { locale, matcher, stems };
  if (nameCache.size >= NAME_CACHE_LIMIT) nameCache.delete(nameCache.keys().next().value ?? '');
  nameCache.set(cacheKey, compiled);
  namesByItems.set(items, compiled);
  return compiled;
}

interface Segment {
  start: number;
  end: number;
  // Said after "except", "but", "pero": a part named there alone is what is wrong.
  afterContrast: boolean;
}

interface Reader {
  transcript: string;
  text: NormalisedText;
  allItems: readonly WordItem[];
  names: readonly PhraseMatch<number[]>[];
  itemStems: readonly ReadonlySet<string>[];
  items: readonly StopItemRef[];
  lx: CompiledLexicon;
}

function nameMatches(text: NormalisedText, matcher: PhraseMatcher<number[]>): PhraseMatch<number[]>[] {
  const out: PhraseMatch<number[]>[] = [];
  for (let i = 0; i < text.tokens.length;) {
    const match = matcher.matchAt(text, i);
    if (match) {
      out.push(match);
      i = match.end;
    } else i += 1;
  }
  return out;
}

function hasNegator(items: readonly WordItem[]): boolean {
  return items.some((item) => item.category?.kind === 'negator' || item.category?.kind === 'praise_negator');
}

// Splits at pause marks, "and" and "except"; not where a negation runs on ("no leaks, cracks or
// cuts"), nor inside an item's name ("lug nuts and studs").
function segmentsOf(reader: Reader): Segment[] {
  const { text, allItems, names, lx } = reader;
  let found: NumberSpan[] | undefined;
  // Only read when a conjunction is met: most answers have none.
  const numbers = (): NumberSpan[] => {
    if (found) return found;
    const tokens = applyHomophones(text.tokens, lx);
    found = [
      ...findNumbers(tokens, lx.locale, { gauge: true }),
      ...findNumbers(tokens, lx.locale, { bareDenominators: true }),
    ];
    return found;
  };
  // "one hundred and ten", "an inch and a half", "una pulgada y media": one value, not two answers.
  const unitEndsAt = (end: number): boolean =>
    [1, 2, 3].some((length) => lx.units.matchAt(text, end - length)?.end === end);
  const joinsValue = (item: WordItem): boolean =>
    numbers().some(
      (span) =>
        // "ten and eight thirty-seconds" is two readings: nobody says a mixed number in 32nds.
        (span.start < item.start && item.end < span.end && (span.form !== 'mixed' || (span.denominator ?? 0) <= 8)) ||
        (span.start === item.end && span.value < 1 && span.form === 'fraction' && unitEndsAt(item.start)),
    );
  const out: Segment[] = [];
  let current: Segment = { start: 0, end: 0, afterContrast: false };
  let currentItems: WordItem[] = [];
  const close = (end: number, next: Segment): void => {
    if (end > current.start) out.push({ ...current, end });
    current = next;
    currentItems = [];
  };
  allItems.forEach((item, index) => {
    const next = allItems.slice(index + 1).find((it) => it.category?.kind !== 'filler');
    const negationRunsOn = hasNegator(currentItems) && next?.category?.kind === 'defect';
    const insideName = names.some((name) => name.start < item.start && item.end <= name.end);
    const kind = item.category?.kind;
    if (kind === 'contrast') {
      close(item.start, { start: item.end, end: item.end, afterContrast: true });
      return;
    }
    if (kind === 'conjunction' && !negationRunsOn && !insideName && !joinsValue(item)) {
      close(item.start, { start: item.end, end: item.end, afterContrast: current.afterContrast });
      return;
    }
    currentItems.push(item);
    if (text.pauseAfter[item.end - 1] === true && !negationRunsOn) {
      close(item.end, { start: item.end, end: item.end, afterContrast: current.afterContrast });
    }
  });
  close(text.tokens.length, current);
  return out;
}

function itemsIn(reader: Reader, segment: Segment): WordItem[] {
  return reader.allItems
    .filter((item) => item.start >= segment.start && item.end <= segment.end)
    .map((item) => ({ ...item, start: item.start - segment.start, end: item.end - segment.start }));
}

function namesIn(reader: Reader, segment: Segment): PhraseMatch<number[]>[] {
  return reader.names.filter((name) => name.start >= segment.start && name.end <= segment.end);
}

// The driver's words for tokens [start, end), without a leading "the", "el".
function wordsOf(reader: Reader, start: number, end: number): string {
  let from = start;
  while (from < end - 1 && reader.lx.articleTokens.has(reader.text.tokens[from] ?? '')) from += 1;
  return (
    originalWords(reader.transcript, reader.lx.locale, from, end) ?? reader.text.surface.slice(from, end).join(' ')
  );
}

type ReadingFit =
  | { kind: 'measurement'; measurement: SpokenMeasurement; quantity: Quantity }
  | { kind: 'unclear'; reason: UnclearReason }
  | { kind: 'none' };

// A value said in the segment, read in the quantity of the items it can belong to.
function readingIn(reader: Reader, segment: Segment, candidates: readonly number[]): ReadingFit {
  const { text, lx, items } = reader;
  const quantities = new Set<Quantity>();
  for (const index of candidates) {
    const expects = items[index]?.expects;
    if (expects?.type === 'measure') quantities.add(expects.quantity);
  }
  if (quantities.size === 0) return { kind: 'none' };
  const segmentText = sliceText(text, segment.start, segment.end);
  const segmentItems = withoutFillers(itemsIn(reader, segment));
  const fits: { measurement: SpokenMeasurement; quantity: Quantity; strength: number }[] = [];
  let unclear: UnclearReason | undefined;
  for (const quantity of QUANTITIES.filter((q) => quantities.has(q))) {
    const from = correctedFrom(segmentText, quantity, lx);
    const spoken = segmentItems
      .filter((item) => item.start >= from)
      .flatMap((item) => segmentText.tokens.slice(item.start, item.end));
    const reading = readMeasurement(spoken, quantity, lx.locale, lx);
    if (reading.kind === 'unclear') {
      unclear ??= reading.reason;
      continue;
    }
    if (reading.kind !== 'measurement') continue;
    if (!reading.unitSaid && PRESSURES.has(quantity)) {
      const fraction = reading.form === 'fraction' || reading.form === 'mixed';
      if (fraction || reading.measurement.value < LOWEST_BARE_PRESSURE_PSI) continue;
    }
    // A unit said is surest; a fraction of an inch ("one thirty-second") beats a bare gauge
    // reading the same words could make ("one thirty" psi).
    const fraction = reading.form === 'fraction' || reading.form === 'mixed';
    const strength = reading.unitSaid ? 3 : fraction && !PRESSURES.has(quantity) ? 2 : 1;
    fits.push({ measurement: reading.measurement, quantity, strength });
  }
  // Where two lengths fit ("a quarter inch" at a brake), the one the value is usual for.
  const strongest = fits.filter((fit) => fit.strength === Math.max(...fits.map((f) => f.strength)));
  const usual =
    strongest.length > 1 ? strongest.filter((fit) => isUsual(fit.quantity, fit.measurement.value)) : strongest;
  const [only, ...others] = usual.length > 0 ? usual : strongest;
  if (only && others.length === 0)
    return { kind: 'measurement', measurement: only.measurement, quantity: only.quantity };
  // "Two" at a brake could be a stroke or a lining: ask for the item.
  if (only) return { kind: 'unclear', reason: 'item_needed' };
  return unclear === undefined ? { kind: 'none' } : { kind: 'unclear', reason: unclear };
}

interface Pending {
  indices: number[];
  start: number;
  end: number;
  // False when the words named fit several items ("the tire" at a dual).
  sure?: boolean;
}

function interpretStopTranscript(
  transcript: string,
  items: readonly StopItemRef[],
  locale: Locale,
  confidence: number | undefined,
): StopInterpretation {
  const opened = openAnswer(transcript, locale, confidence);
  if ('kind' in opened) return opened;
  const { heard, lx, text, allItems } = opened;

  const measured = new Set(items.flatMap((item) => (item.expects.type === 'measure' ? [item.expects.quantity] : [])));
  const fix = fixAtStop(transcript, text, allItems, measured, lx);
  if (fix?.kind === 'unclear') return { kind: 'unclear', reason: fix.reason, ...heard };
  if (fix) return { ...fix, ...heard };

  const whole = classifyWords(text, allItems, lx);
  if (whole.kind === 'unclear' && (whole.reason === 'hedged' || whole.reason === 'vague'))
    return { kind: 'unclear', reason: whole.reason, ...heard };

  const compiledNames = stopNames(items, locale);
  const reader: Reader = {
    transcript,
    text,
    allItems,
    names: nameMatches(text, compiledNames.matcher),
    itemStems: compiledNames.stems,
    items,
    lx,
  };
  const marks = new Map<number, StopMark>();
  const markOrder: number[] = [];
  const mark = (index: number, value: StopMark): void => {
    if (!marks.has(index)) markOrder.push(index);
    marks.set(index, value);
  };
  let sawPass = false;
  let carryItems: Pending | undefined;
  // A problem said before the item it is about ("defect, the air line"); `start` only if it had words.
  let carryProblem: { start?: number; end: number } | undefined;
  let lastDefect: Pending | undefined;
  let lastDefectSegment = -1;
  let currentSegment = 0;
  let unknownTokens = 0;

  const segments = segmentsOf(reader);
  const dropped = takenBack(reader, segments);
  const markDefects = (indices: readonly number[], start: number, end: number): void => {
    const detail = wordsOf(reader, start, end);
    for (const index of indices) {
      const item = items[index];
      if (item) mark(index, { itemKey: item.key, answer: 'defect', detail });
    }
    lastDefect = { indices: [...indices], start, end };
    lastDefectSegment = currentSegment;
  };
  const which = (start: number, end: number, candidates: readonly number[]): StopInterpretation => ({
    kind: 'which',
    detail: wordsOf(reader, start, end),
    candidates: candidates.flatMap((index) => (items[index] ? [items[index].key] : [])),
    ...heard,
  });

  for (let s = 0; s < segments.length; s += 1) {
    const segment = segments[s];
    currentSegment = s;
    if (!segment || dropped.has(s)) continue;
    const segmentItems = itemsIn(reader, segment);
    const segmentText = sliceText(text, segment.start, segment.end);
    const words = withoutFillers(segmentItems);
    if (words.length === 0) continue;
    let verdict: WordsVerdict = classifyWords(segmentText, segmentItems, lx);
    const names = namesIn(reader, segment);
    if (verdict.kind === 'defect' && names.length > 0) verdict = withNamesAsParts(verdict, reader, segment, names);
    // "okay" and "bien" are answers; "please" and "the" alone are not.
    const courteous =
      verdict.kind === 'unclear' &&
      words.every((item) => segmentText.tokens.slice(item.start, item.end).every((t) => lx.courtesyTokens.has(t)));
    if (courteous || saysNoGauge(segmentText, lx)) continue;
    const named = [...new Set(names.flatMap((name) => name.category))];
    const pointed = pointedItems(reader, names);

    if (verdict.kind === 'defect') {
      const span = verdict.span
        ? { start: segment.start + verdict.span.start, end: segment.start + verdict.span.end }
        : undefined;
      // "outer tire ninety, it's low": a value on a measured item is a reading; the limits judge it.
      if (named.length > 0) {
        const reading = readingIn(reader, segment, named);
        if (reading.kind === 'measurement') {
          const outcome = markReading(reader, reading, named, marks, mark);
          if (outcome) return { ...outcome, ...heard };
          continue;
        }
      }
      const own = pointed.items;
      const start = carryProblem?.start ?? carryItems?.start ?? span?.start ?? segment.start;
      const end = span?.end ?? segment.end;
      if (!pointed.sure || carryItems?.sure === false)
        return which(start, end, [...new Set([...(carryItems?.indices ?? []), ...own])]);
      const targets = [...new Set([...(carryItems?.indices ?? []), ...own])];
      carryItems = undefined;
      if (targets.length > 0) {
        markDefects(targets, start, end);
        carryProblem = undefined;
      } else if (lastDefect && lastDefectSegment === s - 1 && span) {
        // "the hub is leaking and it's loose": more about the item just named.
        markDefects(lastDefect.indices, lastDefect.start, span.end);
      } else {
        carryProblem = span ? { start: span.start, end: span.end } : { end: segment.end };
      }
      continue;
    }

    if (verdict.kind === 'not_applicable') {
      const targets = [...new Set([...(carryItems?.indices ?? []), ...named])];
      carryItems = undefined;
      if (targets.length === 0) return { kind: 'unclear', reason: 'item_needed', ...heard };
      for (const index of targets) {
        const item = items[index];
        if (item) mark(index, { itemKey: item.key, answer: 'not_applicable' });
      }
      continue;
    }

    const scope = [...(carryItems?.indices ?? []), ...named];
    const reading = readingIn(reader, segment, scope.length > 0 ? scope : items.map((_, index) => index));
    if (reading.kind === 'measurement') {
      carryItems = undefined;
      const aboutLastDefect =
        scope.length === 0 &&
        lastDefect !== undefined &&
        lastDefectSegment === s - 1 &&
        lastDefect.indices.some((index) => {
          const expects = items[index]?.expects;
          return expects?.type === 'measure' && expects.quantity === reading.quantity;
        });
      if (aboutLastDefect && lastDefect) {
        // "The outer tire is low, ninety psi": the value is part of what is wrong, not another tire's.
        markDefects(lastDefect.indices, lastDefect.start, segment.end);
        continue;
      }
      const before = scope.length === 0 && s > 0 ? namesIn(reader, segments[s - 1] ?? segment) : [];
      const outcome = markReading(reader, reading, scope, marks, mark, before);
      if (outcome) return { ...outcome, ...heard };
      continue;
    }
    if (reading.kind === 'unclear' && verdict.kind !== 'pass')
      return { kind: 'unclear', reason: reading.reason, ...heard };

    if (verdict.kind === 'pass') {
      sawPass = true;
      if (carryProblem) return { kind: 'unclear', reason: 'ambiguous', ...heard };
      carryItems = undefined;
      continue;
    }

    // Neither a verdict nor a value: an item named before what is wrong with it, or noise.
    if (named.length > 0) {
      if (carryProblem) {
        if (!pointed.sure) return which(carryProblem.start ?? segment.start, segment.end, pointed.items);
        markDefects(pointed.items, carryProblem.start ?? segment.start, segment.end);
        carryProblem = undefined;
        continue;
      }
      carryItems = {
        indices: [...new Set([...(carryItems?.indices ?? []), ...pointed.items])],
        start: carryItems?.start ?? segment.start,
        end: segment.end,
        sure: (carryItems?.sure ?? true) && pointed.sure,
      };
      if (segment.afterContrast && pointed.sure && !hasLaterSegment(segments, s)) {
        // "Good except the hub": the part named after the exception is the defect.
        markDefects(carryItems.indices, carryItems.start, carryItems.end);
        carryItems = undefined;
      }
      continue;
    }
    const onlyNegators = words.every((item) => item.category?.kind === 'negator');
    if (onlyNegators) {
      // "No, the hub's leaking": a leading no answers the prompt; a trailing one leaves it open.
      if (s === segments.length - 1) return { kind: 'unclear', reason: 'ambiguous', ...heard };
      continue;
    }
    if (measured.size === 0 && verdict.kind === 'unclear' && saysOnlyNumbers(segmentText, words, lx))
      return { kind: 'unclear', reason: 'number_for_check', ...heard };
    if (segment.afterContrast && words.some((item) => item.category === undefined))
      return which(segment.start, segment.end, []);
    unknownTokens += words.reduce((n, item) => n + (item.category === undefined ? item.end - item.start : 0), 0);
  }

  if (carryProblem) {
    return carryProblem.start === undefined
      ? { kind: 'which', detail: '', candidates: [], ...heard }
      : which(carryProblem.start, carryProblem.end, []);
  }
  if (carryItems) {
    if (carryItems.sure === false && segments.some((segment) => segment.afterContrast))
      return which(carryItems.start, carryItems.end, carryItems.indices);
    if (segments.some((segment) => segment.afterContrast)) {
      markDefects(carryItems.indices, carryItems.start, carryItems.end);
    } else return { kind: 'unclear', reason: 'incomplete', ...heard };
  }
  if (marks.size === 0 && !sawPass) {
    if (whole.kind === 'unclear') return { kind: 'unclear', reason: whole.reason, ...heard };
    return { kind: 'unclear', reason: 'not_understood', ...heard };
  }
  // A good word lost in many words nobody taught us is not an answer to trust.
  if (marks.size === 0 && unknownTokens >= 3) return { kind: 'unclear', reason: 'not_understood', ...heard };
  if (whole.kind === 'unclear' && whole.reason === 'incomplete' && marks.size === 0)
    return { kind: 'unclear', reason: 'incomplete', ...heard };
  return { kind: 'stop', marks: markOrder.flatMap((index) => marks.get(index) ?? []), ...heard };
}

// A fix at a stop reads its new value in whichever of the stop's quantities it fits ("added air,
// now one ten" is a pressure where the stop also has a tread depth).
function fixAtStop(
  transcript: string,
  text: NormalisedText,
  allItems: readonly WordItem[],
  measured: ReadonlySet<Quantity>,
  lx: CompiledLexicon,
): FixReading | undefined {
  const plain = readFix(transcript, text, allItems, undefined, lx);
  if (plain === undefined || plain.kind === 'unclear' || measured.size === 0) return plain;
  const withValue = [...measured].flatMap((quantity) => {
    const fix = readFix(transcript, text, allItems, quantity, lx);
    const value = fix?.kind === 'fixed' ? fix.measurement?.value : undefined;
    if (fix?.kind !== 'fixed' || value === undefined) return [];
    return PRESSURES.has(quantity) && value < LOWEST_BARE_PRESSURE_PSI ? [] : [fix];
  });
  const [only, ...others] = withValue;
  if (only && others.length === 0) return only;
  return only ? { kind: 'unclear', reason: 'item_needed' } : plain;
}

function hasNumber(tokens: readonly string[], lx: CompiledLexicon): boolean {
  return findNumbers(applyHomophones(tokens, lx), lx.locale, { gauge: true }).some((span) => !span.article);
}

// "Seven, I mean eight": the segment with the value taken back says nothing any more.
function takenBack(reader: Reader, segments: readonly Segment[]): Set<number> {
  const out = new Set<number>();
  const { text, lx } = reader;
  if (!text.tokens.some((_, i) => lx.corrections.matchAt(text, i) !== undefined)) return out;
  let lastWithNumber = -1;
  // A segment that is only the correcting word: "one ten, no, one twelve".
  let lastMarkerOnly = -1;
  segments.forEach((segment, s) => {
    let at = segment.start;
    while (at < segment.end && reader.allItems.find((item) => item.start === at)?.category?.kind === 'filler') at += 1;
    const marker = lx.corrections.matchAt(text, at);
    if (!hasNumber(text.tokens.slice(segment.start, segment.end), lx)) {
      if (marker?.end === segment.end) lastMarkerOnly = s;
      return;
    }
    const markerFirst = marker !== undefined && hasNumber(text.tokens.slice(marker.end, segment.end), lx);
    if (lastWithNumber >= 0 && (markerFirst || (lastMarkerOnly === s - 1 && lastMarkerOnly > lastWithNumber))) {
      out.add(lastWithNumber);
      if (lastMarkerOnly === s - 1) out.add(lastMarkerOnly);
    }
    lastWithNumber = s;
  });
  return out;
}

// "The gap looks good": a problem word that is an item's name ("gap", "flat", "play") does not
// outweigh the good word said of it.
function withNamesAsParts(
  verdict: WordsVerdict,
  reader: Reader,
  segment: Segment,
  names: readonly PhraseMatch<number[]>[],
): WordsVerdict {
  const segmentItems = itemsIn(reader, segment);
  if (!segmentItems.some((item) => item.category?.kind === 'pass')) return verdict;
  const asParts = segmentItems.map((item) => {
    const covered = names.some(
      (name) => name.start - segment.start <= item.start && item.end <= name.end - segment.start,
    );
    return covered && item.category?.kind === 'defect' ? { ...item, category: { kind: 'part' as const } } : item;
  });
  const again = classifyWords(sliceText(reader.text, segment.start, segment.end), asParts, reader.lx);
  return again.kind === 'pass' ? again : verdict;
}

// The item a segment's names point at: the one whose names hold the most of the words named
// ("outer tire ... flat" is the outer tire's inflation, not its condition nor the inner's inflation).
function pointedItems(
  reader: Pick<Reader, 'text' | 'itemStems'>,
  names: readonly PhraseMatch<number[]>[],
): { items: number[]; sure: boolean } {
  const candidates = [...new Set(names.flatMap((name) => name.category))];
  if (candidates.length <= 1) return { items: candidates, sure: true };
  const said = new Set(names.flatMap((name) => reader.text.stems.slice(name.start, name.end)));
  const coverage = candidates.map((index) => [...said].filter((stem) => reader.itemStems[index]?.has(stem)).length);
  const best = Math.max(...coverage);
  const items = candidates.filter((_, i) => coverage[i] === best);
  return { items, sure: items.length === 1 };
}

function hasLaterSegment(segments: readonly Segment[], s: number): boolean {
  return s < segments.length - 1;
}

function saysOnlyNumbers(text: NormalisedText, words: readonly WordItem[], lx: CompiledLexicon): boolean {
  const reading = readMeasurement(text.tokens, 'air_pressure', lx.locale, lx);
  return (
    reading.kind !== 'none' && words.every((item) => item.category === undefined || item.category.kind === 'neutral')
  );
}

// A reading goes to the first item of its quantity the answer has not marked yet (a dual's two tires).
function markReading(
  reader: Reader,
  reading: Extract<ReadingFit, { kind: 'measurement' }>,
  scope: readonly number[],
  marks: ReadonlyMap<number, StopMark>,
  mark: (index: number, value: StopMark) => void,
  // Words named just before ("the inner tire is low, ninety psi"): the item they fit best goes first.
  context: readonly PhraseMatch<number[]>[] = [],
): { kind: 'unclear'; reason: UnclearReason } | undefined {
  const fitting = reader.items.flatMap((item, index) =>
    item.expects.type === 'measure' && item.expects.quantity === reading.quantity ? [index] : [],
  );
  const inScope = scope.length > 0 ? fitting.filter((index) => scope.includes(index)) : fitting;
  const said = new Set(context.flatMap((name) => reader.text.stems.slice(name.start, name.end)));
  const fit = (index: number): number => [...said].filter((stem) => reader.itemStems[index]?.has(stem)).length;
  const ordered = said.size === 0 ? inScope : [...inScope].sort((a, b) => fit(b) - fit(a));
  const target = ordered.find((index) => !marks.has(index));
  const item = target === undefined ? undefined : reader.items[target];
  if (target === undefined || !item) return { kind: 'unclear', reason: 'several_values' };
  mark(target, { itemKey: item.key, answer: 'measurement', measurement: reading.measurement });
  return undefined;
}

function stanceOf(interpretation: StopInterpretation): Stance {
  if (interpretation.kind === 'which') return 'problem';
  if (interpretation.kind !== 'stop') return 'other';
  if (interpretation.marks.length === 0) return 'pass';
  return interpretation.marks.some((m) => m.answer === 'defect') ? 'problem' : 'other';
}

// Which of a stop's items a short reply names ("the hub", "the inner one"), for "which one?" after a
// problem said without its item: the items whose names the reply holds most words of.
export function itemsNamedIn(transcript: string, items: readonly StopItemRef[], locale: Locale): string[] {
  const { matcher, stems } = stopNames(items, locale);
  const text = normaliseText(transcript, locale);
  const names = nameMatches(text, matcher);
  if (names.length === 0) return [];
  return pointedItems({ text, itemStems: stems }, names).items.flatMap((index) => items[index]?.key ?? []);
}

// What one answer says of every item at a stop. Items it does not mark pass; a problem it cannot
// tie to one item asks which; hypotheses that disagree between a pass and a problem are unclear.
export function interpretStopAnswer(
  alternatives: readonly Alternative[],
  items: readonly StopItemRef[],
  locale: Locale,
): StopInterpretation {
  const ordered = ranked(alternatives);
  const best = ordered[0];
  if (!best) return { kind: 'unclear', reason: 'empty' };
  const top = interpretStopTranscript(best.transcript, items, locale, best.confidence);
  if (top.kind === 'unclear' || top.kind === 'command') return top;
  const topStance = stanceOf(top);
  for (const alt of ordered.slice(1)) {
    const stance = stanceOf(interpretStopTranscript(alt.transcript, items, locale, alt.confidence));
    if (opposed(topStance, stance)) return disagreement(top);
  }
  return top;
}
