// Text to comparable words: lower case, no accents, numbers as digits, then a light stemmer.
import { stemmer as stemEnglish } from '@orama/stemmers/english';
import { stemmer as stemSpanish } from '@orama/stemmers/spanish';
import type { Locale } from '../checklist/index.js';
import { NUMBER_PHRASES, NUMBER_WORDS, SINGULAR_S } from './lexicon.js';

export interface Word {
  // The word as said, folded (lower case, no accents).
  surface: string;
  stem: string;
}

const STEMMERS: Record<Locale, (word: string) => string> = { en: stemEnglish, es: stemSpanish };

// Recognisers and typed input disagree on accents and apostrophes; both sides are folded alike.
export function foldText(text: string): string {
  // Recognisers mostly give plain lower-case words already.
  if (/^[a-z0-9 ]*$/.test(text)) return text.trim().replace(/ {2,}/g, ' ');
  return text
    .normalize('NFD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/['’`]/g, '')
    .replace(/[^\p{L}\p{N}]+/gu, ' ')
    .trim();
}

// Number phrases by first word, longest first.
function indexNumberPhrases(phrases: readonly [string, string][]): Map<string, { words: string[]; digits: string }[]> {
  const index = new Map<string, { words: string[]; digits: string }[]>();
  for (const [phrase, digits] of phrases) {
    const words = phrase.split(' ');
    const list = index.get(words[0]!) ?? [];
    list.push({ words, digits });
    list.sort((a, b) => b.words.length - a.words.length);
    index.set(words[0]!, list);
  }
  return index;
}

const numberPhrases: Record<Locale, Map<string, { words: string[]; digits: string }[]>> = {
  en: indexNumberPhrases(NUMBER_PHRASES.en),
  es: indexNumberPhrases(NUMBER_PHRASES.es),
};

// Stemming is the costly step and narrations repeat words: keep the stems of words seen.
const stemCache: Record<Locale, Map<string, string>> = { en: new Map(), es: new Map() };

export function stemWord(word: string, locale: Locale): string {
  if (/^\d+$/.test(word)) return word;
  const cache = stemCache[locale];
  let stem = cache.get(word);
  if (stem === undefined) {
    // Short words stem badly ("rin" is a word of its own, not a root).
    stem = word.length <= 3 ? word : STEMMERS[locale](word);
    if (cache.size < 50_000) cache.set(word, stem);
  }
  return stem;
}

export function toWords(text: string, locale: Locale): Word[] {
  const folded = foldText(text);
  if (folded === '') return [];
  const raws = folded.split(' ');
  const numbers = NUMBER_WORDS[locale];
  const phrases = numberPhrases[locale];
  const words: Word[] = [];
  let i = 0;
  while (i < raws.length) {
    const raw = raws[i]!;
    const phrase = phrases.get(raw)?.find((candidate) => candidate.words.every((word, k) => raws[i + k] === word));
    if (phrase) {
      words.push({ surface: phrase.digits, stem: phrase.digits });
      i += phrase.words.length;
      continue;
    }
    // "4/32" was split on the slash; "5th" and "32nds" keep their digits.
    const surface = numbers[raw] ?? raw;
    words.push({ surface, stem: stemWord(surface, locale) });
    i++;
  }
  return words;
}

export function isPluralWord(surface: string): boolean {
  return surface.length > 3 && surface.endsWith('s') && !SINGULAR_S.has(surface);
}

function isOneSwap(a: string, b: string): boolean {
  if (a.length !== b.length) return false;
  let first = -1;
  for (let i = 0; i < a.length; i++) {
    if (a[i] === b[i]) continue;
    if (first === -1) first = i;
    else return i === first + 1 && a[first] === b[i] && a[i] === b[first] && a.slice(i + 1) === b.slice(i + 1);
  }
  return false;
}

// True when a and b differ by at most one insertion, deletion, substitution or swap of neighbours.
export function withinOneEdit(a: string, b: string): boolean {
  if (a === b || isOneSwap(a, b)) return true;
  const lengthGap = a.length - b.length;
  if (lengthGap > 1 || lengthGap < -1) return false;
  const [longer, shorter] = a.length >= b.length ? [a, b] : [b, a];
  let i = 0;
  let j = 0;
  let edits = 0;
  while (i < longer.length && j < shorter.length) {
    if (longer[i] === shorter[j]) {
      i++;
      j++;
      continue;
    }
    if (++edits > 1) return false;
    if (longer.length === shorter.length) j++;
    i++;
  }
  return edits + (longer.length - i) <= 1;
}
