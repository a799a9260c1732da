// The sentences the app speaks back about a measurement, in the driver's words and language.
import en from '@yardcall/prompts/en/interpreter.json' with { type: 'json' };
import es from '@yardcall/prompts/es/interpreter.json' with { type: 'json' };
import type { Locale } from '../checklist/index.js';
import { measurementToWords } from '../numbers/index.js';
import type { SpokenMeasurement, UnclearReason } from './types.js';

type InterpreterPrompts = typeof en;
const PROMPTS: Record<Locale, InterpreterPrompts> = { en, es };

function fill(template: string, values: Record<string, string>): string {
  return template.replace(/\{(\w+)\}/g, (_, key: string) => values[key] ?? '');
}

function capitalise(sentence: string): string {
  return sentence.charAt(0).toUpperCase() + sentence.slice(1);
}

function spokenValue(measurement: SpokenMeasurement, locale: Locale): string {
  const { said } = measurement;
  return measurementToWords(said.value, said.unit, locale);
}

// "Five thirty-seconds. Is that right?"
export function readBackMeasurement(measurement: SpokenMeasurement, locale: Locale): string {
  return capitalise(fill(PROMPTS[locale].readBack, { value: spokenValue(measurement, locale) }));
}

// Asked before keeping a value past its limit; `limitSentence` comes from the limits, already in `locale`.
export function confirmOutOfLimitPrompt(measurement: SpokenMeasurement, limitSentence: string, locale: Locale): string {
  return fill(PROMPTS[locale].confirmOutOfLimit, {
    value: spokenValue(measurement, locale),
    limit: limitSentence.trim(),
  })
    .replace(/\s+/g, ' ')
    .trim();
}

export function confirmKeptPrompt(measurement: SpokenMeasurement, locale: Locale): string {
  return fill(PROMPTS[locale].confirmKept, { value: spokenValue(measurement, locale) });
}

// What to say when an answer was unclear, so the driver knows how to answer.
export function unclearPrompt(reason: UnclearReason, locale: Locale): string {
  return PROMPTS[locale].unclear[reason];
}

export function languageSwitchedPrompt(locale: Locale): string {
  return PROMPTS[locale].languageSwitched;
}
