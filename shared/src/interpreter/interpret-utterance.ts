// Decides what the driver meant from the recogniser's hypotheses. Nothing unclear or negative is a pass.
import type { Expectation, Locale } from '../checklist/index.js';
import { normaliseText, type NormalisedText } from '../text/index.js';
import type { Quantity } from '../units/index.js';
import { classifyWords, withoutFillers, type WordItem } from './classify-words.js';
import { compiledLexicon, type CompiledLexicon } from './compiled-lexicon.js';
import { readFix } from './read-fix.js';
import { correctedFrom, readMeasurement } from './read-measurement.js';
import type { Alternative, Interpretation } from './types.js';

// Recognisers return a handful of hypotheses; more than this adds time, not sense.
const MAX_ALTERNATIVES = 5;
// A measurement hypothesis this far below the best one does not cast doubt on its value.
const VALUE_DOUBT_MARGIN = 0.15;

export function heardOf(transcript: string, confidence: number | undefined): { heard: string; confidence?: number } {
  return confidence === undefined ? { heard: transcript } : { heard: transcript, confidence };
}

// A command is the whole utterance, give or take "okay", "please" and "can you".
export function commandOf(
  text: NormalisedText,
  items: readonly WordItem[],
  lx: CompiledLexicon,
  heard: { heard: string; confidence?: number },
): Extract<Interpretation, { kind: 'command' }> | undefined {
  let found: Extract<Interpretation, { kind: 'command' }> | undefined;
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

// "No gauge", "no tengo manómetro", alone or beside a pass ("good, no gauge"): the reading was not taken.
export function saysNoGauge(text: NormalisedText, lx: CompiledLexicon): boolean {
  const kept: number[] = [];
  let found = false;
  for (let i = 0; i < text.tokens.length;) {
    const match = lx.noGauge.matchAt(text, i);
    if (match) {
      found = true;
      i = match.end;
    } else {
      kept.push(i);
      i += 1;
    }
  }
  if (!found) return false;
  const rest: NormalisedText = {
    tokens: kept.map((i) => text.tokens[i] ?? ''),
    surface: kept.map((i) => text.surface[i] ?? ''),
    stems: kept.map((i) => text.stems[i] ?? ''),
    pauseAfter: kept.map((i) => text.pauseAfter[i] ?? false),
  };
  const restItems = lx.words.scan(rest);
  const quiet = restItems.every((item) => {
    const kind = item.category?.kind;
    if (kind === 'filler' || kind === 'neutral' || kind === 'part') return true;
    return rest.tokens.slice(item.start, item.end).every((t) => lx.courtesyTokens.has(t));
  });
  if (quiet) return true;
  const verdict = classifyWords(rest, restItems, lx);
  if (verdict.kind === 'pass') return true;
  // "No gauge today": a word or two nobody taught us, but no value and no problem.
  const unknown = restItems.filter((item) => item.category === undefined).length;
  return (
    verdict.kind === 'unclear' &&
    unknown <= 2 &&
    restItems.every(
      (item) => item.category === undefined || ['filler', 'neutral', 'part'].includes(item.category.kind),
    ) &&
    readMeasurement(rest.tokens, 'air_pressure', lx.locale, lx).kind === 'none'
  );
}

// What is said after the last word that takes a value back ("one ten, no, one twelve").
function spokenFrom(
  text: NormalisedText,
  items: readonly WordItem[],
  quantity: Quantity,
  lx: CompiledLexicon,
): string[] {
  const from = correctedFrom(text, quantity, lx);
  return items.filter((item) => item.start >= from).flatMap((item) => text.tokens.slice(item.start, item.end));
}

export interface OpenedAnswer {
  heard: { heard: string; confidence?: number };
  lx: CompiledLexicon;
  text: NormalisedText;
  allItems: WordItem[];
  // Without hesitations.
  items: WordItem[];
}

// What every answer goes through first: nothing heard, only hesitation, or a command.
export function openAnswer(
  transcript: string,
  locale: Locale,
  confidence: number | undefined,
): OpenedAnswer | Extract<Interpretation, { kind: 'unclear' | 'command' }> {
  const heard = heardOf(transcript, confidence);
  const lx = compiledLexicon(locale);
  const text = normaliseText(transcript, locale);
  if (text.tokens.length === 0) return { kind: 'unclear', reason: 'empty', ...heard };
  const allItems = lx.words.scan(text);
  const items = withoutFillers(allItems);
  if (items.length === 0) return { kind: 'unclear', reason: 'filler', ...heard };
  return commandOf(text, items, lx, heard) ?? { heard, lx, text, allItems, items };
}

export function interpretTranscript(
  transcript: string,
  expectation: Expectation,
  locale: Locale,
  confidence?: number,
): Interpretation {
  const opened = openAnswer(transcript, locale, confidence);
  if ('kind' in opened) return opened;
  const { heard, lx, text, allItems, items } = opened;

  const quantity = expectation.type === 'measure' ? expectation.quantity : undefined;
  const fix = readFix(transcript, text, allItems, quantity, lx);
  if (fix?.kind === 'unclear') return { kind: 'unclear', reason: fix.reason, ...heard };
  if (fix) return { ...fix, ...heard };
  // Only where a reading is asked for: on a check item "no gauge" may be the dash gauge missing.
  if (quantity !== undefined && saysNoGauge(text, lx)) return { kind: 'no_gauge', ...heard };

  const verdict = classifyWords(text, allItems, lx);
  if (verdict.kind === 'not_applicable') return { kind: 'answer', answer: 'not_applicable', ...heard };

  if (expectation.type === 'measure') {
    if (verdict.kind === 'unclear' && verdict.reason === 'hedged')
      return { kind: 'unclear', reason: 'hedged', ...heard };
    const reading = readMeasurement(
      spokenFrom(text, items, expectation.quantity, lx),
      expectation.quantity,
      locale,
      lx,
    );
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
    // "Good" on a measured check: checked without a reading; the voice loop decides if one was required.
    if (verdict.kind === 'pass') return { kind: 'answer', answer: 'pass', ...heard };
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

export type Stance = 'pass' | 'problem' | 'other';

// One hypothesis says fine and another says a problem: ask again rather than guess.
export function opposed(a: Stance, b: Stance): boolean {
  return (a === 'pass' && b === 'problem') || (a === 'problem' && b === 'pass');
}

export function disagreement(top: { heard: string; confidence?: number }): {
  kind: 'unclear';
  reason: 'disagreement';
  heard: string;
  confidence?: number;
} {
  return {
    kind: 'unclear',
    reason: 'disagreement',
    heard: top.heard,
    ...(top.confidence === undefined ? {} : { confidence: top.confidence }),
  };
}

function stanceOf(interpretation: Interpretation): Stance {
  if (interpretation.kind !== 'answer') return 'other';
  if (interpretation.answer === 'pass') return 'pass';
  return interpretation.answer === 'defect' ? 'problem' : 'other';
}

// Best first: by confidence where the recogniser gave one, else in the order given.
export function ranked(alternatives: readonly Alternative[]): Alternative[] {
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
    if (opposed(topStance, stanceOf(meaning))) return disagreement(top);
    if (top.kind === 'measurement' && meaning.kind === 'measurement') {
      const close =
        alt.confidence === undefined ||
        best.confidence === undefined ||
        alt.confidence >= best.confidence - VALUE_DOUBT_MARGIN;
      const differs = Math.abs(meaning.measurement.value - top.measurement.value) > 1e-6;
      if (close && differs) return disagreement(top);
    }
  }
  return top;
}

// After a defect: was it fixed on the spot ("fixed", "corrected, added air, now one ten")? The new
// reading is read in `quantity` when the item measures one. Undefined when the answer is not a fix.
export function interpretFix(
  alternatives: readonly Alternative[],
  quantity: Quantity | undefined,
  locale: Locale,
): Extract<Interpretation, { kind: 'fixed' | 'unclear' }> | undefined {
  const best = ranked(alternatives)[0];
  if (!best) return undefined;
  const heard = heardOf(best.transcript, best.confidence);
  const lx = compiledLexicon(locale);
  const text = normaliseText(best.transcript, locale);
  const fix = readFix(best.transcript, text, lx.words.scan(text), quantity, lx);
  if (!fix) return undefined;
  return { ...fix, ...heard };
}
