// Narration's word matching: plurals, and a recogniser's near misses of a trade word.
import { SINGULAR_S } from './lexicon.js';

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
