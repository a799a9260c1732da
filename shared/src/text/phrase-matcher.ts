// Longest-phrase matching of lexicon entries over stemmed words: the interpreter's over normalised
// text, narration's over its words. One matcher, so a phrase means the same wherever it is heard.
import type { Locale } from '../checklist/types.js';
import { normaliseText } from './normalise-text.js';

interface Entry<C> {
  // Stems to match, or "=token" for an exact word.
  keys: string[];
  anchored: boolean;
  category: C;
  priority: number;
}

export interface PhraseMatch<C> {
  category: C;
  start: number;
  end: number;
}

// Words as a matcher reads them: each word (tokens) beside its stem (stems), the same length.
export interface StemmedWords {
  readonly tokens: readonly string[];
  readonly stems: readonly string[];
}

export interface PhraseGroup<C> {
  category: C;
  phrases: readonly string[];
}

export interface CompiledPhrase {
  keys: string[];
  anchored: boolean;
}

// The interpreter's phrases: words through normaliseText; "=word" matches that exact word, a final
// "$" only at the end of the answer.
export function compileNormalisedPhrase(phrase: string, locale: Locale): CompiledPhrase {
  const words = phrase.trim().split(/\s+/);
  const anchored = words[words.length - 1] === '$';
  if (anchored) words.pop();
  const keys: string[] = [];
  for (const word of words) {
    const exact = word.startsWith('=');
    const n = normaliseText(exact ? word.slice(1) : word, locale);
    if (exact) keys.push(...n.tokens.map((t) => `=${t}`));
    else keys.push(...n.stems);
  }
  return { keys, anchored };
}

export class PhraseMatcher<C> {
  private readonly byFirst = new Map<string, Entry<C>[]>();

  // Earlier groups win ties between phrases of the same length, and within a group the phrase listed
  // first. `compile` turns a phrase into its keys (by default as the interpreter reads it).
  constructor(
    locale: Locale,
    groups: readonly PhraseGroup<C>[],
    compile: (phrase: string, locale: Locale) => CompiledPhrase = compileNormalisedPhrase,
  ) {
    groups.forEach((group, priority) => {
      for (const phrase of group.phrases) {
        const { keys, anchored } = compile(phrase, locale);
        const first = keys[0];
        if (first === undefined) continue;
        const list = this.byFirst.get(first) ?? [];
        list.push({ keys, anchored, category: group.category, priority });
        this.byFirst.set(first, list);
      }
    });
  }

  private fits(entry: Entry<C>, text: StemmedWords, i: number): boolean {
    const end = i + entry.keys.length;
    if (end > text.tokens.length) return false;
    if (entry.anchored && end !== text.tokens.length) return false;
    return entry.keys.every((key, k) =>
      key.startsWith('=') ? text.tokens[i + k] === key.slice(1) : text.stems[i + k] === key,
    );
  }

  // The longest phrase starting at word i, if any.
  matchAt(text: StemmedWords, i: number): PhraseMatch<C> | undefined {
    const candidates = [
      ...(this.byFirst.get(text.stems[i] ?? '') ?? []),
      ...(this.byFirst.get(`=${text.tokens[i] ?? ''}`) ?? []),
    ];
    let best: Entry<C> | undefined;
    for (const entry of candidates) {
      if (!this.fits(entry, text, i)) continue;
      if (
        !best ||
        entry.keys.length > best.keys.length ||
        (entry.keys.length === best.keys.length && entry.priority < best.priority)
      ) {
        best = entry;
      }
    }
    return best ? { category: best.category, start: i, end: i + best.keys.length } : undefined;
  }

  // Left to right, longest first; words no phrase covers come back as `undefined` categories.
  scan(text: StemmedWords): PhraseMatch<C | undefined>[] {
    const out: PhraseMatch<C | undefined>[] = [];
    let i = 0;
    while (i < text.tokens.length) {
      const match = this.matchAt(text, i);
      if (match) {
        out.push(match);
        i = match.end;
      } else {
        out.push({ category: undefined, start: i, end: i + 1 });
        i += 1;
      }
    }
    return out;
  }
}
