// A measurement said in words with its unit, for read-backs, in the driver's language.
import en from '@yardcall/prompts/en/interpreter.json' with { type: 'json' };
import es from '@yardcall/prompts/es/interpreter.json' with { type: 'json' };
import type { Locale } from '../checklist/index.js';
import type { Unit } from '../units/index.js';
import {
  apocopate,
  englishPartToWords,
  fractionToWords,
  integerToWords,
  numberToWords,
  toCommonFraction,
} from './number-to-words.js';

const PROMPTS: Record<Locale, typeof en> = { en, es };

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
  return `${integerToWords(whole, locale)} and ${englishPartToWords(numerator, denominator, true)} ${unitWord('in', true, locale)}`;
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
