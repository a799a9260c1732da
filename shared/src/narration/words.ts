// Narration's words come from the pipeline the interpreter reads: normaliseText, then findNumbers.
// Each spoken number becomes one word of digits, its value, so "four thirty seconds", "one eighth" and
// the checklist's "4 thirty-seconds" or "4/32" all read as "1/8".
import type { Locale } from '../checklist/index.js';
import { findNumbers, toCommonFraction } from '../numbers/index.js';
import { normaliseText } from '../text/index.js';

export interface Word {
  // The word as said, folded (lower case, no accents), or the digits of a spoken number.
  surface: string;
  stem: string;
}

// A number as its value, written as the trade writes it: 110, 1/8, 5-1/4, or a decimal (0.1) where the
// value is no common fraction; so "4/32", "one eighth" and "point one two five" are one word.
function digitsOf(value: number): string {
  const fraction = toCommonFraction(value);
  if (!fraction) return String(value);
  const { whole, numerator, denominator } = fraction;
  if (numerator === 0) return String(whole);
  const part = `${numerator}/${denominator}`;
  return whole === 0 ? part : `${whole}-${part}`;
}

export function narrationWords(text: string, locale: Locale): Word[] {
  const { tokens, stems } = normaliseText(text, locale);
  // Students name tread depth as drivers do ("four thirty two" is 4/32). An article alone ("a", "una")
  // stays a word: it is a number only before a unit.
  const numbers = findNumbers(tokens, locale, { bareDenominators: true }).filter((span) => !span.article);
  const words: Word[] = [];
  let next = 0;
  for (let i = 0; i < tokens.length;) {
    const span = numbers[next];
    if (span?.start === i) {
      const digits = digitsOf(span.value);
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
