// The sentences the app speaks back about a measurement, in the driver's words and language.
import en from '@yardcall/prompts/en/interpreter.json' with { type: 'json' };
import es from '@yardcall/prompts/es/interpreter.json' with { type: 'json' };
import type { Locale } from '../checklist/index.js';
import {
  apocopate,
  denominatorWord,
  fractionToWords,
  integerToWords,
  numberToWords,
  toCommonFraction,
} from '../numbers/index.js';
import type { Unit } from '../units/index.js';
import type { SpokenMeasurement, UnclearReason } from './types.js';

type InterpreterPrompts = typeof en;
const PROMPTS: Record<Locale, InterpreterPrompts> = { en, es };

function fill(template: string, values: Record<string, string>): string {
  return template.replace(/\{(\w+)\}/g, (_, key: string) => values[key] ?? '');
}

function capitalise(sentence: string): string {
  return sentence.charAt(0).toUpperCase() + sentence.slice(1);
}

function unitWord(unit: Unit, plural: boolean, locale: Locale): string {
  const pair = PROMPTS[locale].units[unit];
  const word = plural ? pair[1] : pair[0];
  return word ?? unit;
}

// Spanish counts inches in the feminine: "una pulgada", "veintiuna pulgadas".
function countInches(whole: number, locale: Locale): string {
  const words = integerToWords(whole, locale);
  return locale === 'es' ? words.replace(/uno$/, 'una') : words;
}

function inchesToWords(value: number, locale: Locale): string {
  const fraction = toCommonFraction(value);
  if (!fraction) return `${numberToWords(value, locale)} ${unitWord('in', value !== 1, locale)}`;
  const { whole, numerator, denominator } = fraction;
  if (numerator === 0) return `${countInches(whole, locale)} ${unitWord('in', whole !== 1, locale)}`;
  const part = fractionToWords(numerator, denominator, locale);
  if (whole === 0) return `${part} ${PROMPTS[locale].ofAnInch}`;
  if (locale === 'es') {
    const tail = numerator === 1 && denominator === 2 ? 'media' : part;
    return `${countInches(whole, locale)} ${unitWord('in', whole !== 1, locale)} y ${tail}`;
  }
  const head = numerator === 1 ? (denominator === 8 ? 'an' : 'a') : integerToWords(numerator, locale);
  return `${integerToWords(whole, locale)} and ${head} ${denominatorWord(denominator, false, locale)} ${unitWord('in', true, locale)}`;
}

// "five thirty-seconds", "one hundred ten psi", "una pulgada y tres cuartos", "cuatro milímetros".
export function measurementToWords(value: number, unit: Unit, locale: Locale): string {
  if (unit === 'in') return inchesToWords(value, locale);
  if (unit === 'in/32' && Number.isInteger(value) && value > 0) return fractionToWords(value, 32, locale);
  const plural = value !== 1;
  const number = numberToWords(value, locale);
  const feminine = unit === 'psi' || unit === 'psi/min';
  const said = locale === 'es' && value === 1 ? (feminine ? 'una' : apocopate(number)) : number;
  return `${said} ${unitWord(unit, plural, locale)}`;
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
