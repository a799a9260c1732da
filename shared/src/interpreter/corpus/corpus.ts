// The interpreter's corpus: what recognisers return for drivers' answers, with the meaning expected.
import type { Expectation, Locale } from '../../checklist/index.js';
import type { Alternative, Command, Interpretation } from '../types.js';
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

export const CORPUS: Readonly<Record<Locale, readonly CorpusEntry[]>> = {
  en: en as CorpusEntry[],
  es: es as CorpusEntry[],
};

function sameValue(got: number, want: number): boolean {
  return Math.abs(got - want) <= 0.01 + Math.abs(want) * 1e-4;
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
      if (got.kind !== 'fixed') return false;
      return want.value === undefined
        ? got.measurement === undefined
        : got.measurement !== undefined && sameValue(got.measurement.value, want.value);
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
