// The driver's own words for a run of normalised tokens: case, accents and apostrophes as said
// ("hub's leaking"), rather than the folded tokens the interpreter matches on.
import type { Locale } from '../checklist/types.js';
import { normaliseText } from './normalise-text.js';

const EDGE_PUNCTUATION = /^[\s,;:.!?¿¡…"“”()-]+|[\s,;:.!?¿¡…"“”()-]+$/gu;

function trimEdges(words: string): string {
  return words.replace(EDGE_PUNCTUATION, '');
}

// The part of `transcript` whose tokens are [start, end), or undefined when a token boundary falls
// inside a spoken word ("110psi" is two tokens) and the words cannot be cut there.
export function originalWords(transcript: string, locale: Locale, start: number, end: number): string | undefined {
  if (start >= end) return '';
  const words = [...transcript.matchAll(/\S+/g)];
  let count = 0;
  let from: number | undefined = start === 0 ? 0 : undefined;
  let to: number | undefined;
  for (const word of words) {
    count += normaliseText(word[0], locale).tokens.length;
    const after = word.index + word[0].length;
    if (count === start) from = after;
    if (count === end && to === undefined) to = after;
  }
  // Words normalised one by one must give the same tokens as the whole sentence.
  if (count !== normaliseText(transcript, locale).tokens.length) return undefined;
  if (from === undefined || to === undefined || to <= from) return undefined;
  return trimEdges(transcript.slice(from, to));
}
