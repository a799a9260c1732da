// Narration's words come from the pipeline the interpreter reads: normaliseText, then findNumbers.
// Each spoken number becomes one word of digits, so "four thirty seconds" and the checklist's
// "4 thirty-seconds" or "4/32" all read as the fraction "4/32".
import type { Locale } from '../checklist/index.js';
import { findNumbers, type NumberSpan } from '../numbers/index.js';
import { normaliseText } from '../text/index.js';

export interface Word {
  // The word as said, folded (lower case, no accents), or the digits of a spoken number.
  surface: string;
  stem: string;
}

// The number as the trade writes it: 110, 5.25, 4/32, 1-3/4.
function digitsOf(span: NumberSpan): string {
  const { value, denominator } = span;
  if (denominator === undefined) return String(value);
  if (span.form === 'mixed') {
    const whole = Math.floor(value);
    return `${whole}-${Math.round((value - whole) * denominator)}/${denominator}`;
  }
  return `${Number((value * denominator).toFixed(6))}/${denominator}`;
}

export function narrationWords(text: string, locale: Locale): Word[] {
  const { tokens, stems } = normaliseText(text, locale);
  // An article alone ("a", "una") stays a word: it is a number only before a unit.
  const numbers = findNumbers(tokens, locale).filter((span) => !span.article);
  const words: Word[] = [];
  let next = 0;
  for (let i = 0; i < tokens.length;) {
    const span = numbers[next];
    if (span?.start === i) {
      const digits = digitsOf(span);
      words.push({ surface: digits, stem: digits });
      next += 1;
      i = span.end;
      continue;
    }
    words.push({ surface: tokens[i]!, stem: stems[i]! });
    i += 1;
  }
  return words;
}
