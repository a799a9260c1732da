// Turns words into terms: trade phrases become one concept term ("#slack_adjuster"), position words
// become cues, filler is dropped, and every other word stays as its stem.
import type { Locale } from '../checklist/index.js';
import { CONCEPTS, CUES, STOP_WORDS, type CueKind } from './lexicon.js';
import { PhraseMatcher, type CompiledPhrase, type PhraseGroup } from '../text/index.js';
import { isPluralWord, withinOneEdit } from './word-match.js';
import { narrationWords, type Word } from './words.js';

export interface Term {
  // "#concept" for a trade phrase, the stem for any other word; empty for a cue.
  term: string;
  cue?: CueKind;
  plural: boolean;
  // Index of the term's first word in the text, for placing it in time.
  wordIndex: number;
}

// What a phrase stands for: a concept term ("#slack_adjuster"), or a cue with an empty term.
interface PhraseMeaning {
  term: string;
  cue?: CueKind;
}

interface PhraseIndex {
  phrases: PhraseMatcher<PhraseMeaning>;
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

// Narration reads phrases as it reads what was said: through narrationWords (spoken numbers as digits).
function compileNarrationPhrase(phrase: string, locale: Locale): CompiledPhrase {
  return { keys: narrationWords(phrase, locale).map((word) => word.stem), anchored: false };
}

// The lexicon's words, for mending a recogniser's near miss; a phrase whose stems came earlier adds none.
function addVocabulary(index: PhraseIndex, phrase: string, locale: Locale, seen: Set<string>): void {
  const words = narrationWords(phrase, locale);
  const stems = words.map((word) => word.stem).join(' ');
  if (seen.has(stems)) return;
  seen.add(stems);
  for (const word of words) {
    index.known.add(word.stem);
    if (word.surface.length < 6 || /\d/.test(word.surface)) continue;
    const bucket = index.vocabulary.get(word.surface[0]!) ?? [];
    if (!bucket.some(([surface]) => surface === word.surface)) bucket.push([word.surface, word.stem]);
    index.vocabulary.set(word.surface[0]!, bucket);
  }
}

function buildIndex(locale: Locale): PhraseIndex {
  // Concepts before cues: a phrase that is both is the concept (the earlier group wins a tie).
  const groups: PhraseGroup<PhraseMeaning>[] = [
    ...CONCEPTS.map((concept) => ({ category: { term: `#${concept.id}` }, phrases: concept[locale] })),
    ...CUES.map((cue) => ({ category: { term: '', cue: cue.cue }, phrases: cue[locale] })),
  ];
  const index: PhraseIndex = {
    phrases: new PhraseMatcher(locale, groups, compileNarrationPhrase),
    stopSurfaces: new Set(STOP_WORDS[locale]),
    stopStems: new Set(STOP_WORDS[locale].map((word) => narrationWords(word, locale)[0]?.stem ?? word)),
    vocabulary: new Map(),
    known: new Set(),
    mended: new Map(),
    termsOfText: new Map(),
  };
  const seen = new Set<string>();
  for (const group of groups) for (const phrase of group.phrases) addVocabulary(index, phrase, locale, seen);
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
  const words = narrationWords(text, locale);
  const stems = words.map((word) => mendStem(word, index));
  const stemmed = { tokens: words.map((word) => word.surface), stems };
  const terms: Term[] = [];
  let i = 0;
  while (i < words.length) {
    const word = words[i]!;
    const match = index.phrases.matchAt(stemmed, i);
    if (match) {
      const { term: meaning, cue } = match.category;
      const last = words[match.end - 1]!;
      const term: Term = { term: meaning, plural: isPluralWord(last.surface), wordIndex: i };
      if (cue) term.cue = cue;
      if (!cue || cue.type !== 'filler') terms.push(term);
      i = match.end;
      continue;
    }
    if (!index.stopSurfaces.has(word.surface) && !index.stopStems.has(stems[i]!)) {
      terms.push({ term: stems[i]!, plural: isPluralWord(word.surface), wordIndex: i });
    }
    i++;
  }
  return { terms, wordCount: words.length };
}
