// Reads an answer said in words: pass, defect (plain or described), negations that mean fine,
// good words next to a problem, hedges and half sentences.
import type { NormalisedText } from '../text/index.js';
import type { CompiledLexicon, WordCategory } from './compiled-lexicon.js';
import type { PhraseMatch } from '../text/index.js';
import type { UnclearReason } from './types.js';

export type WordItem = PhraseMatch<WordCategory | undefined>;

export type WordsVerdict =
  | { kind: 'pass' }
  // `span`: where the words about the defect stand in the text, [start, end) in tokens.
  | { kind: 'defect'; detail?: string; span?: { start: number; end: number } }
  | { kind: 'not_applicable' }
  | { kind: 'unclear'; reason: UnclearReason };

interface PendingNegator {
  reach: 'determiner' | 'verbal';
  gap: number;
  // Only words that may also stand between a negator and a pass word so far.
  passReachable: boolean;
  // Set after the negator has negated a problem: "no leaks and no cracks" continues, "no leaks good" does not.
  afterProblem: boolean;
  // The part last named after the negator: "no hay triángulos" ends on a missing part.
  part?: WordItem;
}

const MAX_GAP = 4;
const MAX_PASS_GAP = 3;

function itemKey(text: NormalisedText, item: WordItem): string {
  return text.stems.slice(item.start, item.end).join(' ');
}

export function withoutFillers(items: readonly WordItem[]): WordItem[] {
  return items.filter((item) => item.category?.kind !== 'filler');
}

function detailOf(
  text: NormalisedText,
  items: readonly WordItem[],
  firstProblem: WordItem,
  lx: CompiledLexicon,
): { detail: string; start: number; end: number } | undefined {
  const contrastBefore = items.filter((item) => item.category?.kind === 'contrast' && item.end <= firstProblem.start);
  let start = contrastBefore.length > 0 ? (contrastBefore[contrastBefore.length - 1]?.end ?? 0) : 0;
  let end = text.tokens.length;
  const isSkippable = (i: number): boolean => {
    const item = items.find((it) => it.start <= i && i < it.end);
    const kind = item?.category?.kind;
    return kind === undefined
      ? false
      : kind === 'filler' || (kind === 'pass' && item !== undefined && item.end <= firstProblem.start);
  };
  // Drop what only announces the defect ("defect", "there's a problem:") and hesitations at the edges.
  for (;;) {
    const marker = lx.defectMarkers.matchAt(text, start);
    if (marker && marker.end < end) start = marker.end;
    else if (
      start < end &&
      (isSkippable(start) || (lx.acknowledgementTokens.has(text.tokens[start] ?? '') && start < firstProblem.start))
    )
      start += 1;
    else break;
  }
  while (end > start) {
    const last = items.find((it) => it.start <= end - 1 && end - 1 < it.end);
    if (last?.category?.kind === 'filler') end = last.start;
    else break;
  }
  const detail = text.surface.slice(start, end).join(' ').trim();
  if (detail === '') return undefined;
  // A bare marker ("defect", "not good") carries no description.
  const onlyMarker = lx.defectMarkers.matchAt(text, start);
  if (onlyMarker && onlyMarker.end === end) return undefined;
  return { detail, start, end };
}

export function classifyWords(text: NormalisedText, allItems: readonly WordItem[], lx: CompiledLexicon): WordsVerdict {
  const items = withoutFillers(allItems);
  const problems: WordItem[] = [];
  let passes = 0;
  let negatedProblems = 0;
  let contrast = false;
  let vague = false;
  let hedged = false;
  let notApplicable = false;
  let negators = 0;
  let unknown = 0;
  let known = 0;
  let pending: PendingNegator | undefined;
  let lastProblemIndex = -1;
  let trailingNegator = false;
  // After "I wouldn't say", "no diría": praise is not a pass.
  let praiseNegated = false;
  let contrastIndex = -1;
  // Something named after "except": "good except the right marker".
  let partAfterContrast = false;
  let answerAfterContrast = false;

  items.forEach((item, index) => {
    const category = item.category;
    const pauseHere = text.pauseAfter[item.end - 1] === true;
    const key = itemKey(text, item);
    switch (category?.kind) {
      case 'negator': {
        negators += 1;
        if (index === items.length - 1) trailingNegator = true;
        const last = index === items.length - 1;
        // "No, it's cracked": a bare no before a pause answers the question, it negates nothing.
        pending =
          pauseHere && !last ? undefined : { reach: category.reach, gap: 0, passReachable: true, afterProblem: false };
        return;
      }
      case 'defect': {
        // "not good", "no funciona" are negative in themselves: a "no" before them does not undo them.
        const inherentlyNegative = lx.verbalNegatorTokens.has(text.tokens[item.start] ?? '');
        if (pending && pending.gap <= MAX_GAP && !inherentlyNegative) {
          negatedProblems += 1;
          pending = { ...pending, gap: 0, afterProblem: true, passReachable: false };
          if (pauseHere && items[index + 1]?.category?.kind !== 'defect') pending = undefined;
        } else {
          problems.push(item);
          lastProblemIndex = index;
          pending = undefined;
        }
        return;
      }
      case 'praise_negator':
        praiseNegated = true;
        pending = undefined;
        return;
      case 'pass': {
        const negates =
          praiseNegated ||
          (pending !== undefined &&
            !pending.afterProblem &&
            pending.passReachable &&
            (pending.reach === 'verbal' ? pending.gap <= MAX_PASS_GAP : pending.gap === 0));
        if (negates) {
          problems.push(item);
          lastProblemIndex = index;
        } else {
          passes += 1;
          if (contrastIndex >= 0) answerAfterContrast = true;
        }
        pending = undefined;
        return;
      }
      case 'post_negator': {
        // "leak free": the problem just before is negated.
        if (lastProblemIndex === index - 1 && problems.length > 0) {
          problems.pop();
          negatedProblems += 1;
        }
        pending = undefined;
        return;
      }
      case 'conjunction':
        if (pending && pauseHere) pending = undefined;
        return;
      case 'contrast':
        contrast = true;
        contrastIndex = index;
        pending = undefined;
        return;
      case 'vague':
        vague = true;
        pending = undefined;
        return;
      case 'hedge':
        hedged = true;
        pending = undefined;
        return;
      case 'not_applicable':
        notApplicable = true;
        pending = undefined;
        return;
      case 'filler':
        return;
      case 'part':
      case 'neutral':
      case 'command':
      case 'language':
      case undefined:
      default: {
        if (category === undefined) unknown += item.end - item.start;
        else known += 1;
        // Anything said after "except" but a hesitation or a bare article names what is wrong.
        if (contrastIndex >= 0 && text.tokens.slice(item.start, item.end).some((t) => !lx.courtesyTokens.has(t))) {
          partAfterContrast = true;
        }
        if (pending && category?.kind === 'part' && !pending.afterProblem) {
          pending.gap += item.end - item.start;
          pending.passReachable = false;
          pending.part = item;
          if (index === items.length - 1 || pauseHere) {
            // "no extinguisher", "sin tapón": the part itself is missing.
            problems.push(item);
            lastProblemIndex = index;
            pending = undefined;
          }
          return;
        }
        if (pending) {
          const gapSet = pending.reach === 'determiner' ? lx.determinerGap : lx.verbalGap;
          const inGap = key.split(' ').every((stem) => gapSet.has(stem));
          if (inGap && pending.gap < MAX_GAP && !pauseHere) {
            pending.gap += item.end - item.start;
            pending.passReachable = pending.passReachable && key.split(' ').every((stem) => lx.passGap.has(stem));
          } else {
            pending = undefined;
          }
        }
      }
    }
  });

  if (vague) return { kind: 'unclear', reason: 'vague' };
  if (hedged) return { kind: 'unclear', reason: 'hedged' };
  const firstProblem = problems[0];
  if (firstProblem) {
    const found = detailOf(text, allItems, firstProblem, lx);
    return found === undefined
      ? { kind: 'defect' }
      : { kind: 'defect', detail: found.detail, span: { start: found.start, end: found.end } };
  }
  if (notApplicable) return { kind: 'not_applicable' };
  // "Good except the right marker": the part named after the exception is the defect.
  if (contrast && partAfterContrast && !answerAfterContrast && negatedProblems === 0) {
    const start = items[contrastIndex]?.end ?? 0;
    const detail = text.surface.slice(start).join(' ').trim();
    return detail === '' ? { kind: 'defect' } : { kind: 'defect', detail, span: { start, end: text.tokens.length } };
  }
  if (contrast) return { kind: 'unclear', reason: 'incomplete' };
  // "Yeah, no": a no left hanging after a good word is not a pass.
  if (trailingNegator && passes > 0) return { kind: 'unclear', reason: 'ambiguous' };
  if (passes > 0 || negatedProblems > 0) {
    // A good word lost in many words nobody taught us is not an answer we can trust.
    if (unknown >= 3 && unknown > known + passes + negatedProblems)
      return { kind: 'unclear', reason: 'not_understood' };
    return { kind: 'pass' };
  }
  if (negators > 0) return { kind: 'unclear', reason: 'ambiguous' };
  return { kind: 'unclear', reason: 'not_understood' };
}
