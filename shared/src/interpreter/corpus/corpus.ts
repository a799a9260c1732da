// The interpreter's corpus: what recognisers return for drivers' answers, with the meaning expected.
import { buildChecklist, type Expectation, type Locale } from '../../checklist/index.js';
import { sampleCombination } from '../../testing.js';
import type { Alternative, Command, Interpretation, StopInterpretation, StopItemRef } from '../types.js';
import en from './en.json' with { type: 'json' };
import es from './es.json' with { type: 'json' };

export type CorpusWant =
  | { kind: 'answer'; answer: 'pass' | 'defect' | 'not_applicable' }
  | { kind: 'command'; command: Command; locale?: Locale }
  | { kind: 'measurement'; value: number }
  // A fix on the spot, with its new reading where one was said.
  | { kind: 'fixed'; value?: number }
  | { kind: 'no_gauge' }
  | { kind: 'unclear' };

export interface CorpusEntry {
  alternatives: Alternative[];
  expect: Expectation;
  want: CorpusWant;
}

// One answer at a stop of the demo tractor and trailer pre-trip, by the stop's key.
export type StopCorpusWant =
  | { kind: 'stop'; marks: { item: string; answer: 'defect' | 'not_applicable' | 'measurement'; value?: number }[] }
  // Candidates, when given, are the items that must be offered, no more and no fewer.
  | { kind: 'which'; candidates?: string[] }
  | { kind: 'command'; command: Command }
  | { kind: 'fixed'; value?: number }
  | { kind: 'unclear' };

export interface StopCorpusEntry {
  stop: string;
  alternatives: Alternative[];
  want: StopCorpusWant;
}

type RawEntry = CorpusEntry | StopCorpusEntry;

function isStopEntry(entry: RawEntry): entry is StopCorpusEntry {
  return 'stop' in entry;
}

const RAW: Record<Locale, readonly RawEntry[]> = {
  en: en as unknown as RawEntry[],
  es: es as unknown as RawEntry[],
};

export const CORPUS: Readonly<Record<Locale, readonly CorpusEntry[]>> = {
  en: RAW.en.filter((entry): entry is CorpusEntry => !isStopEntry(entry)),
  es: RAW.es.filter((entry): entry is CorpusEntry => !isStopEntry(entry)),
};

export const STOP_CORPUS: Readonly<Record<Locale, readonly StopCorpusEntry[]>> = {
  en: RAW.en.filter(isStopEntry),
  es: RAW.es.filter(isStopEntry),
};

const stopsByLocale = new Map<Locale, Map<string, StopItemRef[]>>();

// The items of a stop as the checklist builder makes them, names and all.
export function corpusStopItems(locale: Locale, stopKey: string): StopItemRef[] {
  let stops = stopsByLocale.get(locale);
  if (!stops) {
    const checklist = buildChecklist(sampleCombination(), 'pre_trip', locale);
    stops = new Map(
      checklist.stops.map((stop) => [
        stop.key,
        checklist.items
          .filter((item) => stop.itemKeys.includes(item.key))
          .map((item) => ({ key: item.key, names: item.names, expects: item.expects })),
      ]),
    );
    stopsByLocale.set(locale, stops);
  }
  const items = stops.get(stopKey);
  if (!items) throw new Error(`The corpus names a stop the demo pre-trip does not have: ${stopKey}`);
  return items;
}

function sameValue(got: number, want: number): boolean {
  return Math.abs(got - want) <= 0.01 + Math.abs(want) * 1e-4;
}

// A fix meets its want with the new reading wanted, or with none where none was said.
function fixMeets(got: { measurement?: { value: number } }, value: number | undefined): boolean {
  return value === undefined
    ? got.measurement === undefined
    : got.measurement !== undefined && sameValue(got.measurement.value, value);
}

export function meetsWant(got: Interpretation, want: CorpusWant): boolean {
  switch (want.kind) {
    case 'answer':
      return got.kind === 'answer' && got.answer === want.answer;
    case 'command':
      if (got.kind !== 'command' || got.command !== want.command) return false;
      return want.locale === undefined || (got.command === 'language' && got.locale === want.locale);
    case 'measurement':
      // Conversions from millimetres and bar are compared to 0.01 of the canonical unit.
      return got.kind === 'measurement' && sameValue(got.measurement.value, want.value);
    case 'fixed':
      return got.kind === 'fixed' && fixMeets(got, want.value);
    case 'no_gauge':
      return got.kind === 'no_gauge';
    case 'unclear':
      return got.kind === 'unclear';
  }
}

// The safety failure the corpus must never show: a problem or an unclear answer taken as a pass.
export function isProblemTakenAsPass(got: Interpretation, want: CorpusWant): boolean {
  const problemExpected = (want.kind === 'answer' && want.answer === 'defect') || want.kind === 'unclear';
  return problemExpected && got.kind === 'answer' && got.answer === 'pass';
}

export function meetsStopWant(got: StopInterpretation, want: StopCorpusWant): boolean {
  switch (want.kind) {
    case 'stop': {
      if (got.kind !== 'stop' || got.marks.length !== want.marks.length) return false;
      return want.marks.every((wanted) =>
        got.marks.some(
          (mark) =>
            mark.itemKey === wanted.item &&
            mark.answer === wanted.answer &&
            (wanted.value === undefined ||
              (mark.answer === 'measurement' && sameValue(mark.measurement.value, wanted.value))),
        ),
      );
    }
    case 'which':
      return (
        got.kind === 'which' &&
        (want.candidates === undefined ||
          (got.candidates.length === want.candidates.length &&
            want.candidates.every((c) => got.candidates.includes(c))))
      );
    case 'command':
      return got.kind === 'command' && got.command === want.command;
    case 'fixed':
      return got.kind === 'fixed' && fixMeets(got, want.value);
    case 'unclear':
      return got.kind === 'unclear';
  }
}

// The safety failure at a stop: an item the driver described a problem with passes, or a problem
// or an unclear answer passes the whole stop.
export function isStopProblemTakenAsPass(got: StopInterpretation, want: StopCorpusWant): boolean {
  if (got.kind !== 'stop') return false;
  if (want.kind === 'which' || want.kind === 'unclear') return !got.marks.some((mark) => mark.answer === 'defect');
  if (want.kind !== 'stop') return false;
  return want.marks.some(
    (wanted) => wanted.answer === 'defect' && !got.marks.some((mark) => mark.itemKey === wanted.item),
  );
}
