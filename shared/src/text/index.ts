// The text area's surface: what the interpreter, the number reader and narration use.
export { normaliseText, sliceText, type NormalisedText } from './normalise-text.js';
export { originalWords } from './original-words.js';
export { stemWord } from './stem-word.js';
export {
  PhraseMatcher,
  type CompiledPhrase,
  type PhraseGroup,
  type PhraseMatch,
  type StemmedWords,
} from './phrase-matcher.js';
export { NUMBER_WORDS, SAID_NUMBERS, type NumberWords } from './number-words.js';
