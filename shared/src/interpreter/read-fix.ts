// Reads a fix made on the spot: "fixed", "corrected, added air, now one ten", "cambié el foco".
import type { NormalisedText } from '../text/index.js';
import { originalWords } from '../text/index.js';
import { findNumbers } from '../numbers/index.js';
import type { Quantity } from '../units/index.js';
import type { WordItem } from './classify-words.js';
import type { CompiledLexicon } from './compiled-lexicon.js';
import { applyHomophones, correctedFrom, numberOptionsFor, readMeasurement } from './read-measurement.js';
import type { SpokenFix, UnclearReason } from './types.js';

export type FixReading = ({ kind: 'fixed' } & SpokenFix) | { kind: 'unclear'; reason: UnclearReason };

function itemStartingAt(items: readonly WordItem[], i: number): WordItem | undefined {
  return items.find((item) => item.start === i);
}

// Hesitations, "okay" and "I", "ya" may stand before the fix.
function fixStart(text: NormalisedText, items: readonly WordItem[], lx: CompiledLexicon): number {
  let i = 0;
  while (i < text.tokens.length) {
    const leadIn = lx.fixLeadIns.matchAt(text, i);
    const item = itemStartingAt(items, i);
    if (leadIn) i = leadIn.end;
    else if (item?.category?.kind === 'filler') i = item.end;
    else if (lx.acknowledgementTokens.has(text.tokens[i] ?? '')) i += 1;
    else break;
  }
  return i;
}

// A fix only when the answer starts with one: "not fixed", "couldn't fix it" are defects.
export function readFix(
  transcript: string,
  text: NormalisedText,
  allItems: readonly WordItem[],
  quantity: Quantity | undefined,
  lx: CompiledLexicon,
): FixReading | undefined {
  const match = lx.fixes.matchAt(text, fixStart(text, allItems, lx));
  if (!match) return undefined;
  let start = match.category === 'announce' ? match.end : match.start;
  // "Fixed, and added air": the joining word is not part of what was done.
  for (;;) {
    const item = itemStartingAt(allItems, start);
    const kind = item?.category?.kind;
    if (item && (kind === 'filler' || kind === 'conjunction')) start = item.end;
    else break;
  }
  const after = allItems.filter((item) => item.start >= start);
  const kinds = new Set(after.map((item) => item.category?.kind));
  if (kinds.has('hedge') || kinds.has('vague')) return { kind: 'unclear', reason: 'hedged' };

  let end = text.tokens.length;
  let measurement: SpokenFix['measurement'];
  if (quantity !== undefined) {
    const tail = applyHomophones(text.tokens.slice(start), lx);
    const first = findNumbers(tail, lx.locale, numberOptionsFor(quantity)).find((span) => !span.article);
    if (first) {
      const numberAt = start + first.start;
      const from = Math.max(numberAt, correctedFrom(text, quantity, lx));
      const spoken = allItems
        .filter((item) => item.start >= from && item.category?.kind !== 'filler')
        .flatMap((item) => text.tokens.slice(item.start, item.end));
      const reading = readMeasurement(spoken, quantity, lx.locale, lx);
      if (reading.kind === 'unclear') return { kind: 'unclear', reason: reading.reason };
      if (reading.kind === 'measurement') {
        measurement = reading.measurement;
        end = numberAt;
        // "added air, now one ten": "now" leads the reading, it is not what was done.
        while (end > start) {
          const token = text.tokens[end - 1] ?? '';
          const filler = allItems.find((item) => item.start <= end - 1 && end - 1 < item.end)?.category?.kind;
          if (lx.readingLeadInTokens.has(token) || filler === 'filler') end -= 1;
          else break;
        }
      }
    }
  }
  // "Fixed it, good now": praise after the fix is not what was done.
  for (;;) {
    const last = allItems.filter((item) => item.start >= start && item.end <= end).pop();
    const kind = last?.category?.kind;
    const quiet =
      last !== undefined &&
      (kind === 'pass' ||
        kind === 'filler' ||
        text.tokens
          .slice(last.start, last.end)
          .every((t) => lx.courtesyTokens.has(t) || lx.readingLeadInTokens.has(t)));
    if (!last || !quiet) break;
    end = last.start;
  }
  const action = originalWords(transcript, lx.locale, start, end) ?? text.surface.slice(start, end).join(' ');
  return measurement ? { kind: 'fixed', action, measurement } : { kind: 'fixed', action };
}
