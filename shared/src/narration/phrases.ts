// Turns words into terms: trade phrases become one concept term ("#slack_adjuster"), position words
// become cues, filler is dropped, and every other word stays as its stem.
import type { Locale } from '../checklist/index.js';
import { CONCEPTS, CUES, STOP_WORDS, type CueKind } from './lexicon.js';
import { toWords, type Word } from '../text/index.js';
import { isPluralWord, withinOneEdit } from './word-match.js';

export interface Term {
  // "#concept" for a trade phrase, the stem for any other word; empty for a cue.
  term: string;
  cue?: CueKind;
  plural: boolean;
  // Index of the term's first word in the text, for placing it in time.
  wordIndex: number;
}

interface PhraseEntry {
  stems: string[];
  term: string;
  cue?: CueKind;
}

interface PhraseIndex {
  byFirstStem: Map<string, PhraseEntry[]>;
  stopSurfaces: Set<string>;
  stopStems: Set<string>;
  // Long words of the lexicon by first letter, with their stems, for mending a recogniser's near miss.
  vocabulary: Map<string, [string, string][]>;
  known: Set<string>;
  mended: Map<string, string>;
  // Checklists repeat the same titles and points at every wheel end.
  termsOfText: Map<string, TermsOfText>;
}

const indexes = new Map<Locale, PhraseIndex>();

function addPhrase(index: PhraseIndex, phrase: string, locale: Locale, term: string, cue?: CueKind): void {
  const words = toWords(phrase, locale);
  const stems = words.map((word) => word.stem);
  const first = stems[0];
  if (first === undefined) return;
  const entries = index.byFirstStem.get(first) ?? [];
  // The first registration of a phrase wins; concepts are registered before cues.
  if (entries.some((entry) => entry.stems.join(' ') === stems.join(' '))) return;
  const entry: PhraseEntry = { stems, term };
  if (cue) entry.cue = cue;
  entries.push(entry);
  entries.sort((a, b) => b.stems.length - a.stems.length);
  index.byFirstStem.set(first, entries);
  for (const word of words) {
    index.known.add(word.stem);
    if (word.surface.length < 6 || /\d/.test(word.surface)) continue;
    const bucket = index.vocabulary.get(word.surface[0]!) ?? [];
    if (!bucket.some(([surface]) => surface === word.surface)) bucket.push([word.surface, word.stem]);
    index.vocabulary.set(word.surface[0]!, bucket);
  }
}

function buildIndex(locale: Locale): PhraseIndex {
  const index: PhraseIndex = {
    byFirstStem: new Map(),
    stopSurfaces: new Set(STOP_WORDS[locale]),
    stopStems: new Set(STOP_WORDS[locale].map((word) => toWords(word, locale)[0]?.stem ?? word)),
    vocabulary: new Map(),
    known: new Set(),
    mended: new Map(),
    termsOfText: new Map(),
  };
  for (const concept of CONCEPTS) {
    for (const phrase of concept[locale]) addPhrase(index, phrase, locale, `#${concept.id}`);
  }
  for (const cue of CUES) {
    for (const phrase of cue[locale]) addPhrase(index, phrase, locale, '', cue.cue);
  }
  for (const bucket of index.vocabulary.values()) bucket.sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  return index;
}

function phraseIndex(locale: Locale): PhraseIndex {
  let index = indexes.get(locale);
  if (!index) {
    index = buildIndex(locale);
    indexes.set(locale, index);
  }
  return index;
}

// A long word one letter away from a trade word is taken as that word ("ajustadro", "extinguisher").
function mendStem(word: Word, index: PhraseIndex): string {
  if (word.surface.length < 6 || index.known.has(word.stem) || index.stopStems.has(word.stem)) return word.stem;
  const seen = index.mended.get(word.surface);
  if (seen !== undefined) return seen;
  let mended = word.stem;
  for (const [surface, stem] of index.vocabulary.get(word.surface[0]!) ?? []) {
    if (withinOneEdit(word.surface, surface)) {
      mended = stem;
      break;
    }
  }
  if (index.mended.size < 50_000) index.mended.set(word.surface, mended);
  return mended;
}

function matchAt(words: readonly Word[], stems: readonly string[], start: number, entry: PhraseEntry): boolean {
  if (start + entry.stems.length > words.length) return false;
  for (let k = 0; k < entry.stems.length; k++) {
    if (stems[start + k] !== entry.stems[k]) return false;
  }
  return true;
}

export interface TermsOfText {
  terms: Term[];
  wordCount: number;
}

// The result is shared between callers with the same text: read it, never change it.
export function toTerms(text: string, locale: Locale): TermsOfText {
  const index = phraseIndex(locale);
  const seen = index.termsOfText.get(text);
  if (seen) return seen;
  const result = termsOf(text, locale, index);
  if (index.termsOfText.size < 20_000) index.termsOfText.set(text, result);
  return result;
}

function termsOf(text: string, locale: Locale, index: PhraseIndex): TermsOfText {
  const words = toWords(text, locale);
  const stems = words.map((word) => mendStem(word, index));
  const terms: Term[] = [];
  let i = 0;
  while (i < words.length) {
    const word = words[i]!;
    const entries = index.byFirstStem.get(stems[i]!);
    const entry = entries?.find((candidate) => matchAt(words, stems, i, candidate));
    if (entry) {
      const last = words[i + entry.stems.length - 1]!;
      const term: Term = { term: entry.term, plural: isPluralWord(last.surface), wordIndex: i };
      if (entry.cue) term.cue = entry.cue;
      if (!entry.cue || entry.cue.type !== 'filler') terms.push(term);
      i += entry.stems.length;
      continue;
    }
    if (!index.stopSurfaces.has(word.surface) && !index.stopStems.has(stems[i]!)) {
      terms.push({ term: stems[i]!, plural: isPluralWord(word.surface), wordIndex: i });
    }
    i++;
  }
  return { terms, wordCount: words.length };
}
