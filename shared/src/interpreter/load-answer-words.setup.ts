// Every test file starts with the answer words of every language, as the server and the CLI do;
// compiled-lexicon.test.ts checks the loading itself on a fresh module.
import { LOCALES } from '../checklist/index.js';
import { loadAnswerWords } from './compiled-lexicon.js';

await Promise.all(LOCALES.map(loadAnswerWords));
