export * from './types.js';
export { interpretFix, interpretTranscript, interpretUtterance } from './interpret-utterance.js';
export { PLAUSIBLE_RANGES } from './read-measurement.js';
export type { AnswerLexicon, SpokenCommand } from './lexicon/lexicon-types.js';
export { EN_LEXICON } from './lexicon/en.js';
export { ES_LEXICON } from './lexicon/es.js';
export * from './read-back.js';
export * from './interpret-confirmation.js';
export { splitEndNote } from './split-end-note.js';
