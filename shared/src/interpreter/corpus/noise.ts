// Noise for the interpreter's property tests: random text in either language that holds no pass word.
import fc from 'fast-check';
import type { Locale } from '../../checklist/index.js';
import { normaliseText } from '../../text/index.js';
import { EN_LEXICON } from '../lexicon/en.js';
import { ES_LEXICON } from '../lexicon/es.js';

// A short random string is sometimes a real pass word ("k", "si"): that is not noise.
const PASS_WORDS = new Set(
  [...EN_LEXICON.pass, ...ES_LEXICON.pass].flatMap((phrase) => normaliseText(phrase, 'en').tokens),
);

export const noise: fc.Arbitrary<[string, Locale]> = fc
  .tuple(fc.string({ maxLength: 30 }), fc.constantFrom<Locale>('en', 'es'))
  .filter(([text, locale]) => !normaliseText(text, locale).tokens.some((token) => PASS_WORDS.has(token)));
