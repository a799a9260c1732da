// Reads the answer to "Is that right?" after an out-of-limit value: keep it, correct it, or ask again.
import type { Locale } from '../checklist/index.js';
import { normaliseText } from '../text/index.js';
import { compiledLexicon } from './compiled-lexicon.js';
import { interpretTranscript } from './interpret-utterance.js';
import type { Alternative, ConfirmationResult, SpokenMeasurement } from './types.js';

function confirmationOf(
  alternative: Alternative,
  locale: Locale,
  pending: SpokenMeasurement | undefined,
): ConfirmationResult {
  const heard =
    alternative.confidence === undefined
      ? { heard: alternative.transcript }
      : { heard: alternative.transcript, confidence: alternative.confidence };
  const lx = compiledLexicon(locale);
  const text = normaliseText(alternative.transcript, locale);
  if (text.tokens.length === 0) return { kind: 'unclear', reason: 'empty', ...heard };
  let yes = 0;
  let no = 0;
  for (let i = 0; i < text.tokens.length;) {
    const match = lx.confirmation.matchAt(text, i);
    if (match) {
      if (match.category === 'yes') yes += 1;
      else no += 1;
      i = match.end;
    } else i += 1;
  }
  const meaning = pending
    ? interpretTranscript(
        alternative.transcript,
        { type: 'measure', quantity: pending.quantity },
        locale,
        alternative.confidence,
      )
    : undefined;
  if (meaning?.kind === 'command' && meaning.command !== 'language' && yes === 0 && no === 0) {
    return { kind: 'command', command: meaning.command, ...heard };
  }
  if (meaning?.kind === 'measurement') {
    const same = pending !== undefined && Math.abs(meaning.measurement.value - pending.value) < 1e-6;
    // "Yes, six" repeats the value; "no, six" or just "six" corrects it.
    if (same && no === 0) return { kind: 'confirm', ...heard };
    return { kind: 'correct', measurement: meaning.measurement, ...heard };
  }
  if (
    meaning?.kind === 'unclear' &&
    ['implausible', 'several_values', 'unit_mismatch', 'disagreement'].includes(meaning.reason)
  ) {
    return { kind: 'unclear', reason: meaning.reason, ...heard };
  }
  if (no > 0 && yes === 0) return { kind: 'correct', ...heard };
  if (yes > 0 && no === 0) return { kind: 'confirm', ...heard };
  return { kind: 'unclear', reason: yes > 0 && no > 0 ? 'disagreement' : 'not_understood', ...heard };
}

// `pending` is the value being confirmed, so a spoken correction can be read in its quantity.
export function interpretConfirmation(
  alternatives: readonly Alternative[],
  locale: Locale,
  pending?: SpokenMeasurement,
): ConfirmationResult {
  const ordered = [...alternatives]
    .filter((a) => typeof a.transcript === 'string')
    .sort((a, b) => (b.confidence ?? -1) - (a.confidence ?? -1));
  const best = ordered[0];
  if (!best) return { kind: 'unclear', reason: 'empty' };
  const top = confirmationOf(best, locale, pending);
  if (top.kind !== 'confirm') return top;
  // A keep must not rest on a hypothesis that another hears as a correction.
  for (const alt of ordered.slice(1, 5)) {
    const other = confirmationOf(alt, locale, pending);
    if (other.kind === 'correct') return { kind: 'unclear', reason: 'disagreement', heard: top.heard };
  }
  return top;
}
