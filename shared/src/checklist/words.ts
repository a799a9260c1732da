// The spoken words of the checklist's zones, positions and items, per locale, kept as data in
// @yardcall/prompts (measures and verdicts are in measure-words.ts).
import en from '@yardcall/prompts/en/checklist.json' with { type: 'json' };
import es from '@yardcall/prompts/es/checklist.json' with { type: 'json' };
import type { Locale } from './types.js';

export type ChecklistWords = typeof en;
export type ItemWordId = keyof ChecklistWords['items'];
export type AreaWordId = keyof ChecklistWords['areas'];
export type PartWordId = keyof ChecklistWords['parts'];

// Assigning through the English shape makes the compiler refuse a Spanish file that lacks a key.
const spanish: ChecklistWords = es;

const WORDS: Record<Locale, ChecklistWords> = { en, es: spanish };

export function checklistWords(locale: Locale): ChecklistWords {
  return WORDS[locale];
}
