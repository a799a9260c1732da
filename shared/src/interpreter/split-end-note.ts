// "The marker lens is cracked, end note": a note ended inside its own sentence.
import type { Locale } from '../checklist/index.js';
import { normaliseText, originalWords, sliceText, type NormalisedText } from '../text/index.js';
import { compiledLexicon, type CompiledLexicon } from './compiled-lexicon.js';

// The longest "end note" phrase is a handful of words ("that's all for the note").
const LONGEST_END_PHRASE = 6;

// Where the words after the note's last word start, once "please", "okay" and hesitations are left off.
function endBeforeSignOffs(text: NormalisedText, lx: CompiledLexicon, withSignOffs = true): number {
  let end = text.tokens.length;
  for (;;) {
    let moved = false;
    for (let start = Math.max(0, end - 3); start < end; start += 1) {
      const signOff = lx.signOffs.matchAt(text, start);
      const word = lx.words.matchAt(text, start);
      const fits = (withSignOffs && signOff?.end === end) || (word?.category.kind === 'filler' && word.end === end);
      if (fits) {
        end = start;
        moved = true;
        break;
      }
    }
    if (!moved || end === 0) return end;
  }
}

// `words` is the note without the closing phrase, in the driver's words; `ended` says the note is over.
// Only a closing phrase at the end of what was said counts, never one in mid-sentence.
export function splitEndNote(transcript: string, locale: Locale): { words: string; ended: boolean } {
  const lx = compiledLexicon(locale);
  const text = normaliseText(transcript, locale);
  const end = endBeforeSignOffs(text, lx);
  for (let start = Math.max(0, end - LONGEST_END_PHRASE); start < end; start += 1) {
    const match = lx.words.matchAt(text, start);
    if (match?.category.kind !== 'command' || match.category.command !== 'end_note' || match.end !== end) continue;
    // "cracked lens, um, end note": the hesitation before the closing phrase is not part of the note.
    const last = endBeforeSignOffs(sliceText(text, 0, start), lx, false);
    const words = originalWords(transcript, locale, 0, last) ?? text.surface.slice(0, last).join(' ');
    return { words, ended: true };
  }
  return { words: transcript.trim(), ended: false };
}
