// The interpreter's surface: what the walk-around's voice loop and the CLI use. The lexicons, the
// measurement reader and its plausible ranges stay inside (the area's tests import the files).
export type {
  Alternative,
  Command,
  Interpretation,
  SpokenFix,
  SpokenMeasurement,
  StopMark,
  UnclearReason,
} from './types.js';
export { interpretFix, interpretUtterance } from './interpret-utterance.js';
export { interpretStopAnswer, itemsNamedIn } from './interpret-stop-answer.js';
export { interpretConfirmation } from './interpret-confirmation.js';
export { splitEndNote } from './split-end-note.js';
export { answerWordsLoaded, loadAnswerWords } from './compiled-lexicon.js';
export {
  confirmKeptPrompt,
  confirmOutOfLimitPrompt,
  languageSwitchedPrompt,
  readBackMeasurement,
  unclearPrompt,
} from './read-back.js';
