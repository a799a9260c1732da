// Times interpretUtterance per utterance and interpretStopAnswer per stop answer over the corpus,
// repeated; the goal for both is p99 <= 1 ms.
import { measure, type BenchResult } from '../bench/index.js';
import { LOCALES } from '../checklist/index.js';
import { loadAnswerWords } from './compiled-lexicon.js';
import { CORPUS, corpusStopItems, STOP_CORPUS } from './corpus/corpus.js';
import { interpretStopAnswer } from './interpret-stop-answer.js';
import { interpretUtterance } from './interpret-utterance.js';

export type { BenchResult } from '../bench/index.js';

const ROUNDS = 20;
// The stop corpus is smaller: more rounds give its p99 as many runs as the utterances', so one
// pause of a busy machine does not make it.
const STOP_ROUNDS = 150;
const WARM_UP_ROUNDS = 3;
const GOAL_P99_MS = 1;

export async function runInterpreterBench(): Promise<BenchResult[]> {
  await Promise.all(LOCALES.map(loadAnswerWords));
  const entries = LOCALES.flatMap((locale) => CORPUS[locale].map((entry) => ({ locale, entry })));
  // The stops' items are built once, as the voice loop has them at hand.
  const stopAnswers = LOCALES.flatMap((locale) =>
    STOP_CORPUS[locale].map((entry) => ({ locale, entry, items: corpusStopItems(locale, entry.stop) })),
  );
  return [
    measure(
      `interpretUtterance per utterance (${entries.length} corpus utterances x ${ROUNDS})`,
      GOAL_P99_MS,
      entries.length * ROUNDS,
      (run) => {
        const { locale, entry } = entries[run % entries.length]!;
        interpretUtterance(entry.alternatives, entry.expect, locale);
      },
      { warmUpRuns: entries.length * WARM_UP_ROUNDS, judgedAt: 'p99' },
    ),
    measure(
      `interpretStopAnswer per stop answer (${stopAnswers.length} corpus answers x ${STOP_ROUNDS})`,
      GOAL_P99_MS,
      stopAnswers.length * STOP_ROUNDS,
      (run) => {
        const { locale, entry, items } = stopAnswers[run % stopAnswers.length]!;
        interpretStopAnswer(entry.alternatives, items, locale);
      },
      { warmUpRuns: stopAnswers.length * WARM_UP_ROUNDS, judgedAt: 'p99' },
    ),
  ];
}
