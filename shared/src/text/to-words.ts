// Folded words with spoken numbers written as digits ("four thirty seconds" -> 4 32), each with its
// stem: what narration scoring matches against checklist titles.
import type { Locale } from '../checklist/types.js';
import { foldText } from './fold-text.js';
import { NUMBER_WORDS, type NumberWords } from './number-words.js';
import { stemWord } from './stem-word.js';

export interface Word {
  // The word as said, folded (lower case, no accents), or the digits of a spoken number.
  surface: string;
  stem: string;
}

interface DigitWords {
  values: Map<string, number>;
  tens: Readonly<Record<string, number>>;
  source: NumberWords;
}

// Smaller denominators ("half", "third", "quarter") are also ordinals or everyday words: kept as words.
const SMALLEST_DENOMINATOR_AS_DIGITS = 16;

function digitWordsOf(words: NumberWords): DigitWords {
  const values = new Map<string, number>();
  for (const [word, value] of Object.entries(words.small)) {
    // "a", "un", "una" are articles far more often than numbers.
    if (!words.articles.includes(word)) values.set(word, value);
  }
  for (const [word, value] of Object.entries(words.tens)) values.set(word, value);
  for (const [word, value] of Object.entries(words.hundreds)) values.set(word, value);
  if (words.hundredWord) values.set(words.hundredWord, 100);
  for (const [word, value] of Object.entries(words.denominators)) {
    if (value >= SMALLEST_DENOMINATOR_AS_DIGITS) values.set(word, value);
  }
  return { values, tens: words.tens, source: words };
}

const DIGIT_WORDS: Record<Locale, DigitWords> = {
  en: digitWordsOf(NUMBER_WORDS.en),
  es: digitWordsOf(NUMBER_WORDS.es),
};

// A number word or digits, with a run-together fraction suffix allowed ("32avos", "treintaidosavos").
function valueOfWord(raw: string, digits: DigitWords): number | undefined {
  const value = digits.values.get(raw);
  if (value !== undefined) return value;
  for (const suffix of digits.source.denominatorSuffixes) {
    if (!raw.endsWith(suffix) || raw.length === suffix.length) continue;
    const stem = raw.slice(0, -suffix.length);
    if (/^\d+$/.test(stem)) return Number(stem);
    const spoken = digits.values.get(stem);
    if (spoken !== undefined) return spoken;
  }
  return undefined;
}

const UNIT_MAX = 9;

// Reads one spoken number at raws[i]: returns its value and how many words it took.
function readNumber(
  raws: readonly string[],
  i: number,
  digits: DigitWords,
): { value: number; length: number } | undefined {
  const first = raws[i]!;
  let value = valueOfWord(first, digits);
  if (value === undefined) return undefined;
  let length = 1;
  const words = digits.source;
  if (digits.tens[first] !== undefined) {
    // "thirty two", "treinta y dos"; "thirty seconds" is 32 as a denominator.
    const joined = words.tensJoiner !== undefined && raws[i + length] === words.tensJoiner ? 1 : 0;
    const next = raws[i + length + joined];
    const unit = next === undefined ? undefined : (words.small[next] ?? words.ordinalUnits[next]);
    if (next !== undefined && unit !== undefined && unit >= 1 && unit <= UNIT_MAX && !words.articles.includes(next)) {
      value += unit;
      length += joined + 1;
    }
  }
  // "treinta y dos avos": the suffix said apart belongs to the number.
  const after = raws[i + length];
  if (after !== undefined && words.denominatorSuffixes.includes(after)) length += 1;
  return { value, length };
}

export function toWords(text: string, locale: Locale): Word[] {
  const folded = foldText(text);
  if (folded === '') return [];
  const raws = folded.split(' ');
  const digits = DIGIT_WORDS[locale];
  const words: Word[] = [];
  let i = 0;
  while (i < raws.length) {
    const number = readNumber(raws, i, digits);
    if (number) {
      const surface = String(number.value);
      words.push({ surface, stem: surface });
      i += number.length;
      continue;
    }
    // "4/32" was split on the slash; "5th" keeps its digits.
    const raw = raws[i]!;
    words.push({ surface: raw, stem: stemWord(raw, locale) });
    i++;
  }
  return words;
}
