// Times interpretUtterance per utterance over the whole corpus, repeated; the goal is p99 <= 1 ms.
import { measure, type BenchResult } from '../bench/index.js';
import { LOCALES } from '../checklist/index.js';
import { CORPUS } from './corpus/corpus.js';
import { interpretUtterance } from './interpret-utterance.js';

export type { BenchResult } from '../bench/index.js';

const ROUNDS = 20;
const WARM_UP_ROUNDS = 3;
const GOAL_P99_MS = 1;

export function runInterpreterBench(): BenchResult[] {
  const entries = LOCALES.flatMap((locale) => CORPUS[locale].map((entry) => ({ locale, entry })));
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
  ];
}
