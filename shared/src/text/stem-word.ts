// The one stemmer for everything Yardcall reads: Snowball English and Spanish (about 3 KB gzip for both).
import { stemmer as stemEnglish } from '@orama/stemmers/english';
import { stemmer as stemSpanish } from '@orama/stemmers/spanish';
import type { Locale } from '../checklist/types.js';

const STEMMERS: Record<Locale, (word: string) => string> = { en: stemEnglish, es: stemSpanish };

// Stemming is the costly step and speech repeats words: keep the stems of words seen.
const stemCache: Record<Locale, Map<string, string>> = { en: new Map(), es: new Map() };
const STEM_CACHE_LIMIT = 50_000;

export function stemWord(word: string, locale: Locale): string {
  // Numbers ("110", "5/32", "32nds") and short words ("rin" is a word of its own, not a root) stay whole.
  if (word.length <= 3 || /\d/.test(word)) return word;
  const cache = stemCache[locale];
  let stem = cache.get(word);
  if (stem === undefined) {
    stem = STEMMERS[locale](word);
    if (cache.size < STEM_CACHE_LIMIT) cache.set(word, stem);
  }
  return stem;
}
