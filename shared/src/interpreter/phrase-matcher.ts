// Longest-phrase matching of lexicon entries over normalised, stemmed words.
import type { Locale } from '../checklist/index.js';
import { normaliseText, type NormalisedText } from '../text/index.js';

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

export interface PhraseGroup<C> {
  category: C;
  phrases: readonly string[];
}

function compileKeys(phrase: string, locale: Locale): { keys: string[]; anchored: boolean } {
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

  // Earlier groups win ties between phrases of the same length.
  constructor(locale: Locale, groups: readonly PhraseGroup<C>[]) {
    groups.forEach((group, priority) => {
      for (const phrase of group.phrases) {
        const { keys, anchored } = compileKeys(phrase, locale);
        const first = keys[0];
        if (first === undefined) continue;
        const list = this.byFirst.get(first) ?? [];
        list.push({ keys, anchored, category: group.category, priority });
        this.byFirst.set(first, list);
      }
    });
  }

  private fits(entry: Entry<C>, text: NormalisedText, i: number): boolean {
    const end = i + entry.keys.length;
    if (end > text.tokens.length) return false;
    if (entry.anchored && end !== text.tokens.length) return false;
    return entry.keys.every((key, k) =>
      key.startsWith('=') ? text.tokens[i + k] === key.slice(1) : text.stems[i + k] === key,
    );
  }

  matchAt(text: NormalisedText, i: number): PhraseMatch<C> | undefined {
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
  scan(text: NormalisedText): PhraseMatch<C | undefined>[] {
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
