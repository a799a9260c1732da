// Decides what the driver meant from the recogniser's hypotheses. Nothing unclear or negative is a pass.
import type { Expectation, Locale } from '../checklist/index.js';
import { normaliseText, type NormalisedText } from '../text/index.js';
import { classifyWords, withoutFillers, type WordItem } from './classify-words.js';
import { compiledLexicon, type CompiledLexicon } from './compiled-lexicon.js';
import { readMeasurement } from './read-measurement.js';
import type { Alternative, Interpretation } from './types.js';

// Recognisers return a handful of hypotheses; more than this adds time, not sense.
const MAX_ALTERNATIVES = 5;
// A measurement hypothesis this far below the best one does not cast doubt on its value.
const VALUE_DOUBT_MARGIN = 0.15;

function heardOf(transcript: string, confidence: number | undefined): { heard: string; confidence?: number } {
  return confidence === undefined ? { heard: transcript } : { heard: transcript, confidence };
}

// A command is the whole utterance, give or take "okay", "please" and "can you".
function commandOf(
  text: NormalisedText,
  items: readonly WordItem[],
  lx: CompiledLexicon,
  heard: { heard: string; confidence?: number },
): Interpretation | undefined {
  let found: Interpretation | undefined;
  for (const item of items) {
    const category = item.category;
    if (category?.kind === 'command') found = { kind: 'command', command: category.command, ...heard };
    else if (category?.kind === 'language')
      found = { kind: 'command', command: 'language', locale: category.locale, ...heard };
    else {
      const courteous = text.tokens.slice(item.start, item.end).every((t) => lx.courtesyTokens.has(t));
      if (!courteous) return undefined;
    }
  }
  return found;
}

function onlyNumbers(text: NormalisedText, items: readonly WordItem[], lx: CompiledLexicon): boolean {
  const reading = readMeasurement(text.tokens, 'air_pressure', lx.locale, lx);
  if (reading.kind === 'none') return false;
  return items.every(
    (item) => item.category === undefined || item.category.kind === 'neutral' || item.category.kind === 'part',
  );
}

function leakHeldInWords(text: NormalisedText, lx: CompiledLexicon): boolean {
  for (let i = 0; i < text.tokens.length; i += 1) {
    const match = lx.noLeak.matchAt(text, i);
    if (!match) continue;
    const before = text.tokens[i - 1];
    const negatedAgain =
      before !== undefined && lx.verbalNegatorTokens.has(before) && !lx.verbalNegatorTokens.has(text.tokens[i] ?? '');
    if (!negatedAgain) return true;
  }
  return false;
}

export function interpretTranscript(
  transcript: string,
  expectation: Expectation,
  locale: Locale,
  confidence?: number,
): Interpretation {
  const heard = heardOf(transcript, confidence);
  const lx = compiledLexicon(locale);
  const text = normaliseText(transcript, locale);
  if (text.tokens.length === 0) return { kind: 'unclear', reason: 'empty', ...heard };
  const allItems = lx.words.scan(text);
  const items = withoutFillers(allItems);
  if (items.length === 0) return { kind: 'unclear', reason: 'filler', ...heard };

  const command = commandOf(text, items, lx, heard);
  if (command) return command;

  const verdict = classifyWords(text, allItems, lx);
  if (verdict.kind === 'not_applicable') return { kind: 'answer', answer: 'not_applicable', ...heard };

  if (expectation.type === 'measure') {
    if (verdict.kind === 'unclear' && verdict.reason === 'hedged')
      return { kind: 'unclear', reason: 'hedged', ...heard };
    const spoken = items.flatMap((item) => text.tokens.slice(item.start, item.end));
    const reading = readMeasurement(spoken, expectation.quantity, locale, lx);
    if (reading.kind === 'measurement') return { kind: 'measurement', measurement: reading.measurement, ...heard };
    if (reading.kind === 'unclear') return { kind: 'unclear', reason: reading.reason, ...heard };
    if (verdict.kind === 'defect')
      return { kind: 'answer', answer: 'defect', ...(verdict.detail ? { detail: verdict.detail } : {}), ...heard };
    if (expectation.quantity === 'leak_rate' && leakHeldInWords(text, lx)) {
      return {
        kind: 'measurement',
        measurement: { quantity: 'leak_rate', value: 0, unit: 'psi/min', said: { value: 0, unit: 'psi/min' } },
        ...heard,
      };
    }
    // "Good" is not a value.
    if (verdict.kind === 'pass') return { kind: 'unclear', reason: 'value_needed', ...heard };
    return { kind: 'unclear', reason: verdict.reason, ...heard };
  }

  switch (verdict.kind) {
    case 'pass':
      return { kind: 'answer', answer: 'pass', ...heard };
    case 'defect':
      return { kind: 'answer', answer: 'defect', ...(verdict.detail ? { detail: verdict.detail } : {}), ...heard };
    case 'unclear':
      if (verdict.reason === 'not_understood' && onlyNumbers(text, items, lx)) {
        return { kind: 'unclear', reason: 'number_for_check', ...heard };
      }
      return { kind: 'unclear', reason: verdict.reason, ...heard };
  }
}

type Stance = 'pass' | 'problem' | 'other';

function stanceOf(interpretation: Interpretation): Stance {
  if (interpretation.kind !== 'answer') return 'other';
  if (interpretation.answer === 'pass') return 'pass';
  return interpretation.answer === 'defect' ? 'problem' : 'other';
}

// Best first: by confidence where the recogniser gave one, else in the order given.
function ranked(alternatives: readonly Alternative[]): Alternative[] {
  return alternatives
    .map((alternative, index) => ({ alternative, index }))
    .filter(({ alternative }) => typeof alternative.transcript === 'string')
    .sort((a, b) => {
      const ca = a.alternative.confidence ?? -1;
      const cb = b.alternative.confidence ?? -1;
      return ca === cb ? a.index - b.index : cb - ca;
    })
    .slice(0, MAX_ALTERNATIVES)
    .map(({ alternative }) => alternative);
}

export function interpretUtterance(
  alternatives: readonly Alternative[],
  expectation: Expectation,
  locale: Locale,
): Interpretation {
  const ordered = ranked(alternatives);
  const best = ordered[0];
  if (!best) return { kind: 'unclear', reason: 'empty' };
  const top = interpretTranscript(best.transcript, expectation, locale, best.confidence);
  if (top.kind === 'unclear' || top.kind === 'command') return top;
  const others = ordered
    .slice(1)
    .map((alt) => ({ alt, meaning: interpretTranscript(alt.transcript, expectation, locale, alt.confidence) }));
  const topStance = stanceOf(top);
  for (const { alt, meaning } of others) {
    const stance = stanceOf(meaning);
    // One hypothesis says fine and another says a problem: ask again rather than guess.
    if ((topStance === 'pass' && stance === 'problem') || (topStance === 'problem' && stance === 'pass')) {
      return {
        kind: 'unclear',
        reason: 'disagreement',
        heard: top.heard,
        ...(top.confidence === undefined ? {} : { confidence: top.confidence }),
      };
    }
    if (top.kind === 'measurement' && meaning.kind === 'measurement') {
      const close =
        alt.confidence === undefined ||
        best.confidence === undefined ||
        alt.confidence >= best.confidence - VALUE_DOUBT_MARGIN;
      const differs = Math.abs(meaning.measurement.value - top.measurement.value) > 1e-6;
      if (close && differs) {
        return {
          kind: 'unclear',
          reason: 'disagreement',
          heard: top.heard,
          ...(top.confidence === undefined ? {} : { confidence: top.confidence }),
        };
      }
    }
  }
  return top;
}
