// Says a number in words, for read-backs, from the words the parser reads: it reads every form this writes.
import type { Locale } from '../checklist/index.js';
import { SAID_NUMBERS } from '../text/index.js';

const EN = SAID_NUMBERS.en;
const ES = SAID_NUMBERS.es;

function pick(list: readonly string[], index: number): string {
  const word = list[index];
  if (word === undefined) throw new RangeError(`No word for ${index}`);
  return word;
}

function englishBelowThousand(n: number): string {
  if (n < 20) return pick(EN.small, n);
  if (n < 100) {
    const unit = n % 10;
    return unit === 0 ? pick(EN.tens, n / 10) : `${pick(EN.tens, Math.floor(n / 10))}-${pick(EN.small, unit)}`;
  }
  const rest = n % 100;
  const head = `${pick(EN.small, Math.floor(n / 100))} hundred`;
  return rest === 0 ? head : `${head} ${englishBelowThousand(rest)}`;
}

function spanishBelowThousand(n: number): string {
  if (n < 30) return pick(ES.small, n);
  if (n < 100) {
    const unit = n % 10;
    const tens = pick(ES.tens, Math.floor(n / 10));
    return unit === 0 ? tens : `${tens} y ${pick(ES.small, unit)}`;
  }
  if (n === 100) return 'cien';
  const rest = n % 100;
  const head = pick(ES.hundreds, Math.floor(n / 100));
  return rest === 0 ? head : `${head} ${spanishBelowThousand(rest)}`;
}

// "uno" shortens before "mil" and before a noun: "veintiún mil", "un cuarto".
export function apocopate(words: string): string {
  return words.replace(/veintiuno$/, 'veintiún').replace(/(^|\s)uno$/, '$1un');
}

export function integerToWords(n: number, locale: Locale): string {
  if (!Number.isInteger(n) || n < 0 || n >= 1_000_000) {
    throw new RangeError(`Only whole numbers from 0 to 999999 are said in words, not ${n}`);
  }
  const below = locale === 'en' ? englishBelowThousand : spanishBelowThousand;
  if (n < 1000) return below(n);
  const thousands = Math.floor(n / 1000);
  const rest = n % 1000;
  const head =
    locale === 'en' ? `${below(thousands)} thousand` : thousands === 1 ? 'mil' : `${apocopate(below(thousands))} mil`;
  return rest === 0 ? head : `${head} ${below(rest)}`;
}

// Denominators as said, in the singular; the plural adds an s ("halves" aside).
const DENOMINATORS: Record<Locale, Record<number, string>> = {
  en: { 2: 'half', 3: 'third', 4: 'quarter', 8: 'eighth', 16: 'sixteenth', 32: 'thirty-second', 64: 'sixty-fourth' },
  es: {
    2: 'medio',
    3: 'tercio',
    4: 'cuarto',
    8: 'octavo',
    16: 'dieciseisavo',
    32: 'treintaidosavo',
    64: 'sesentaicuatroavo',
  },
};

export function denominatorWord(denominator: number, plural: boolean, locale: Locale): string {
  const word = DENOMINATORS[locale][denominator];
  if (!word) throw new RangeError(`No word for a denominator of ${denominator}`);
  if (!plural) return word;
  return word === 'half' ? 'halves' : `${word}s`;
}

// "five thirty-seconds", "un cuarto", "tres dieciseisavos".
export function fractionToWords(numerator: number, denominator: number, locale: Locale): string {
  const head = integerToWords(numerator, locale);
  const said = locale === 'es' && numerator === 1 ? 'un' : locale === 'es' ? apocopate(head) : head;
  return `${said} ${denominatorWord(denominator, numerator !== 1, locale)}`;
}

// The part of a mixed number after "and" in English: "a quarter", "an eighth", "three quarters"; before
// a unit the denominator stays singular ("one and three quarter inches").
export function englishPartToWords(numerator: number, denominator: number, beforeUnit: boolean): string {
  const head = numerator === 1 ? (denominator === 8 ? 'an' : 'a') : integerToWords(numerator, 'en');
  return `${head} ${denominatorWord(denominator, numerator !== 1 && !beforeUnit, 'en')}`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

export interface CommonFraction {
  whole: number;
  numerator: number;
  denominator: number;
}

// Splits a value into whole + k/d for the fractions the trade says (halves to sixty-fourths, thirds).
export function toCommonFraction(n: number): CommonFraction | undefined {
  const whole = Math.floor(n + 1e-9);
  const part = n - whole;
  if (Math.abs(part) < 1e-9) return { whole, numerator: 0, denominator: 1 };
  for (const d of [64, 3]) {
    const k = Math.round(part * d);
    if (k > 0 && k < d && Math.abs(part * d - k) < 1e-6) {
      const g = gcd(k, d);
      return { whole, numerator: k / g, denominator: d / g };
    }
  }
  return undefined;
}

function decimalToWords(n: number, locale: Locale): string {
  const [intPart = '0', decimals = ''] = n.toFixed(4).replace(/0+$/, '').split('.');
  const head = integerToWords(Number(intPart), locale);
  const digits = decimals.split('').map((d) => integerToWords(Number(d), locale));
  // Spanish says two decimals as one number: "uno coma veinticinco".
  const tail =
    locale === 'es' && decimals.length === 2 && !decimals.startsWith('0')
      ? integerToWords(Number(decimals), locale)
      : digits.join(' ');
  return `${head} ${locale === 'en' ? 'point' : 'coma'} ${tail}`;
}

// Words for any value from 0 to 999999: integers, common fractions, else decimals to four places.
export function numberToWords(n: number, locale: Locale): string {
  if (!Number.isFinite(n) || n < 0 || n >= 1_000_000) {
    throw new RangeError(`Only numbers from 0 to 999999 are said in words, not ${n}`);
  }
  const fraction = toCommonFraction(n);
  if (!fraction) return decimalToWords(n, locale);
  const { whole, numerator, denominator } = fraction;
  if (numerator === 0) return integerToWords(whole, locale);
  if (whole === 0) return fractionToWords(numerator, denominator, locale);
  const and = locale === 'en' ? 'and' : 'y';
  const part =
    locale === 'en'
      ? englishPartToWords(numerator, denominator, false)
      : fractionToWords(numerator, denominator, locale);
  return `${integerToWords(whole, locale)} ${and} ${part}`;
}
